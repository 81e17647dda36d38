import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { CollectionForm } from "@/components/collections/collection-form";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { COUNTRIES } from "@/lib/catalogue/countries";
import { getCollection } from "@/lib/collections/queries";
import { NotFoundError } from "@/lib/errors";

export const metadata: Metadata = { title: "Edit collection" };

export default async function EditCollectionPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=/collections/${id}/edit`);
  const collection = await getCollection(actor, Number(id)).catch((e) => {
    if (e instanceof NotFoundError || Number.isNaN(Number(id))) notFound();
    throw e;
  });
  if (!can(actor, "collection.edit", { ownerId: collection.createdBy })) {
    return <Notice tone="warn">You may edit only the collections you added; editors may edit any.</Notice>;
  }
  return (
    <>
      <PageTitle title={`Edit: ${collection.name}`} />
      <CollectionForm countries={COUNTRIES} existing={collection} />
    </>
  );
}
