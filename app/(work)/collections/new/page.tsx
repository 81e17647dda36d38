import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { CollectionForm } from "@/components/collections/collection-form";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { COUNTRIES } from "@/lib/catalogue/countries";

export const metadata: Metadata = { title: "Add a collection" };

export default async function NewCollectionPage() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/collections/new");
  if (!can(actor, "collection.create")) return <Notice tone="warn">Adding collections needs the contributor role. Your role is {actor.role}.</Notice>;
  return (
    <>
      <PageTitle title="Add a collection" />
      <CollectionForm countries={COUNTRIES} />
    </>
  );
}
