import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { SourceForm } from "@/components/sources/source-form";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { listCollections } from "@/lib/collections/queries";
import { datingMargins } from "@/lib/config";
import { NotFoundError } from "@/lib/errors";
import { getSource } from "@/lib/sources/queries";

export const metadata: Metadata = { title: "Edit source" };

export default async function EditSourcePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=/sources/${id}/edit`);
  const source = await getSource(actor, Number(id)).catch((e) => {
    if (e instanceof NotFoundError) notFound();
    throw e;
  });
  if (!can(actor, "source.edit", { ownerId: source.createdBy }) || source.deletedAt) {
    return <Notice tone="warn">You may edit only the sources you catalogued; editors may edit any.</Notice>;
  }
  const collections = await listCollections(actor);
  const { collection: _c, place, creatorName: _n, ...values } = source;
  return (
    <>
      <PageTitle title={`Edit: ${source.title}`} />
      <SourceForm
        collections={collections.map((c) => ({ id: c.id, name: c.name }))}
        margins={datingMargins()}
        existing={{
          id: source.id,
          version: source.version,
          values,
          place: place
            ? {
                id: place.id,
                kind: place.kind,
                name: place.name,
                countryCode: place.countryCode,
                country: countryName(place.countryCode),
                subdivisionCode: place.subdivisionCode,
                latitude: place.latitude,
                longitude: place.longitude,
              }
            : null,
        }}
      />
    </>
  );
}
