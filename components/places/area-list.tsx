// The historical areas, as everyone sees them; editors also get an edit control under each.
import { EmptyState } from "@/components/ui/empty-state";
import { formatCoordinates } from "@/lib/places/format";
import type { PlaceRecord } from "@/lib/places/schemas";
import { AreaEditor } from "./area-form";

export function AreaList({ areas, editable }: { areas: PlaceRecord[]; editable: boolean }) {
  if (areas.length === 0) {
    return (
      <EmptyState title="No historical areas yet">
        Editors define an area, such as a kingdom or a province, when a work can be placed in it but not in one city.
      </EmptyState>
    );
  }
  return (
    <ul aria-label="Historical areas" className="grid gap-4 sm:grid-cols-2">
      {areas.map((area) => (
        <li key={area.id} className="rounded border border-rule bg-card p-4">
          <p className="font-serif text-xl">{area.name}</p>
          <p className="text-sm text-ink-soft">
            {area.country ?? "No single country"}
            {area.countryCode && <span className="ml-2 font-mono text-xs text-ink-faint">{area.countryCode}</span>}
          </p>
          <p className="mt-1 font-mono text-sm">
            <span className="sr-only">Representative point: </span>
            {formatCoordinates(area.latitude, area.longitude)}
          </p>
          {area.description && <p className="mt-2 text-sm">{area.description}</p>}
          {editable && <AreaEditor area={area} />}
        </li>
      ))}
    </ul>
  );
}
