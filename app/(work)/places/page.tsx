import type { Metadata } from "next";
import { AreaForm } from "@/components/places/area-form";
import { AreaList } from "@/components/places/area-list";
import { PlaceLookup } from "@/components/places/place-lookup";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { listAreas } from "@/lib/places/queries";

export const metadata: Metadata = { title: "Places" };

export default async function PlacesPage() {
  const actor = await currentActor();
  const areas = await listAreas(actor);
  const editor = can(actor, "place.define_area");
  return (
    <>
      <PageTitle
        title="Places"
        lead="Where the works were made: a city from the GeoNames gazetteer, or, when no single city fits, a historical area that an editor has defined by a representative point."
      />
      <section aria-labelledby="lookup-heading" className="mb-10">
        <h2 id="lookup-heading" className="mb-1 text-2xl">
          Look up the gazetteer
        </h2>
        <p className="mb-3 max-w-prose text-sm text-ink-soft">
          Type the start of a name, with or without accents, to see the country, subdivision code and coordinates the archive holds.
        </p>
        <PlaceLookup />
      </section>
      <section aria-labelledby="areas-heading">
        <h2 id="areas-heading" className="mb-3 text-2xl">
          Historical areas
        </h2>
        {editor && (
          <div className="mb-6 rounded border border-rule bg-card p-4">
            <h3 className="mb-3 text-xl">Add a historical area</h3>
            <AreaForm />
          </div>
        )}
        <AreaList areas={areas} editable={editor} />
      </section>
    </>
  );
}
