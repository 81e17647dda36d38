import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SourceForm } from "@/components/sources/source-form";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { listCollections } from "@/lib/collections/queries";
import { datingMargins } from "@/lib/config";

export const metadata: Metadata = { title: "Catalogue a source" };

export default async function NewSourcePage() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/sources/new");
  if (!can(actor, "source.create")) return <Notice tone="warn">Cataloguing needs the contributor role. Your role is {actor.role}.</Notice>;
  const collections = await listCollections(actor);
  return (
    <>
      <PageTitle title="Catalogue a source" lead="One artwork or printed image. Only the title and the object type are required; say what you know and how sure you are." />
      <SourceForm collections={collections.map((c) => ({ id: c.id, name: c.name }))} margins={datingMargins()} />
    </>
  );
}
