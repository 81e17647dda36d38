"use client";

// The light table itself: the chosen crops side by side at one height, one shared view (zoom and
// relative offset) over all of them, and their order, which lives in the page's link. Every change of
// order or height replaces the link (router.replace), so what is on screen is always what a copied link
// opens. Regions the server did not show stay at the end of the link, so that a table passed on keeps
// them for someone who may see them.
import { useRouter } from "next/navigation";
import { useCallback, useId, useMemo, useState, type KeyboardEvent } from "react";
import { CROP_HEIGHTS, lightTableHref, moveRegion, type CropSize } from "@/lib/light-table/links";
import type { LightTableItem } from "@/lib/light-table/types";
import { panBy, PAN_STEP, WHOLE_VIEW, zoomIn, zoomOut, zoomTo, type SharedView } from "@/lib/light-table/view";
import { KeepAsSelection } from "./keep-as-selection";
import { SaveAsDossier } from "./save-as-dossier";
import { TableControls } from "./table-controls";
import { TableItem } from "./table-item";

type Props = {
  items: LightTableItem[];
  /** Every id of the link, shown or not, in its order. */
  requested: number[];
  size: CropSize;
  proposed: boolean;
  /** Signed-in readers and up keep dossiers; visitors get no button they could not use. */
  canSaveDossier: boolean;
};

export function LightTableBoard({ items, requested, size: initialSize, proposed, canSaveDossier }: Props) {
  const router = useRouter();
  const hintId = useId();
  const byId = useMemo(() => new Map(items.map((i) => [i.regionId, i])), [items]);
  const shownKey = items.map((i) => i.regionId).join(",");

  // The server's order is the truth; a local copy answers at once while the new link loads.
  const [seen, setSeen] = useState({ key: shownKey, size: initialSize });
  const [order, setOrder] = useState(() => items.map((i) => i.regionId));
  const [size, setSize] = useState(initialSize);
  if (seen.key !== shownKey || seen.size !== initialSize) {
    setSeen({ key: shownKey, size: initialSize });
    setOrder(items.map((i) => i.regionId));
    setSize(initialSize);
  }
  const [view, setView] = useState<SharedView>(WHOLE_VIEW);
  const [dragged, setDragged] = useState<number | null>(null);
  const [target, setTarget] = useState<number | null>(null);
  const [announcement, setAnnouncement] = useState("");

  const hiddenIds = useMemo(() => requested.filter((id) => !byId.has(id)), [requested, byId]);
  const publish = useCallback(
    (nextOrder: number[], nextSize: CropSize) => {
      router.replace(lightTableHref([...nextOrder, ...hiddenIds], { size: nextSize, proposed }), { scroll: false });
    },
    [router, hiddenIds, proposed],
  );

  const shown = order.map((id) => byId.get(id)).filter((i): i is LightTableItem => Boolean(i));
  const nameOf = (id: number) => {
    const i = byId.get(id);
    return i?.label ? `“${i.label}”` : `Region ${id}`;
  };

  const reorder = (next: number[], message: string) => {
    setOrder(next);
    setAnnouncement(message);
    publish(next, size);
  };
  const move = (id: number, by: -1 | 1) => {
    const from = order.indexOf(id);
    const next = moveRegion(order, from, from + by);
    if (next !== order) reorder(next, `${nameOf(id)} moved to place ${from + by + 1} of ${order.length}.`);
  };
  const drop = (onto: number) => {
    if (dragged !== null && dragged !== onto) {
      const next = moveRegion(order, order.indexOf(dragged), order.indexOf(onto));
      reorder(next, `${nameOf(dragged)} moved to place ${next.indexOf(dragged) + 1} of ${order.length}.`);
    }
    setDragged(null);
    setTarget(null);
  };
  const remove = (id: number) => reorder(order.filter((x) => x !== id), `${nameOf(id)} removed from the table.`);
  const changeSize = (next: CropSize) => {
    setSize(next);
    publish(order, next);
  };

  const onCropKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const pan: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };
    if (e.key === "+" || e.key === "=") setView(zoomIn);
    else if (e.key === "-" || e.key === "_") setView(zoomOut);
    else if (e.key === "0") setView(WHOLE_VIEW);
    else if (pan[e.key]) setView((v) => panBy(v, (pan[e.key][0] * PAN_STEP) / v.zoom, (pan[e.key][1] * PAN_STEP) / v.zoom));
    else return;
    e.preventDefault();
  };

  return (
    <div>
      <TableControls
        size={size}
        onSize={changeSize}
        view={view}
        onZoomIn={() => setView(zoomIn)}
        onZoomOut={() => setView(zoomOut)}
        onZoom={(z) => setView((v) => zoomTo(v, z))}
        onReset={() => setView(WHOLE_VIEW)}
        hintId={hintId}
      >
        <KeepAsSelection order={order} />
        {canSaveDossier && order.length > 0 && <SaveAsDossier order={order} nameOf={nameOf} />}
      </TableControls>
      <p aria-live="polite" className="sr-only">
        {announcement}
      </p>
      {shown.length === 0 ? (
        <p className="rounded border border-dashed border-rule px-6 py-10 text-center text-ink-soft">
          The table is empty. Add regions from a photograph&apos;s list of regions.
        </p>
      ) : (
        <ol aria-label="Regions on the table" className="flex flex-wrap items-start gap-6">
          {shown.map((item, index) => (
            <TableItem
              key={item.regionId}
              item={item}
              index={index}
              count={shown.length}
              height={CROP_HEIGHTS[size]}
              view={view}
              onView={setView}
              onCropKey={onCropKey}
              hintId={hintId}
              dragging={dragged === item.regionId}
              dropTarget={target === item.regionId && dragged !== item.regionId}
              onDragStart={setDragged}
              onDragEnd={() => {
                setDragged(null);
                setTarget(null);
              }}
              onDragOver={setTarget}
              onDrop={drop}
              onMove={move}
              onRemove={remove}
            />
          ))}
        </ol>
      )}
    </div>
  );
}
