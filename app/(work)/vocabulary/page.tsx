import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { AspectEntry } from "@/components/vocabulary/aspect-entry";
import { AspectForm } from "@/components/vocabulary/aspect-form";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { ASPECT_SECTIONS, SECTION_LABELS } from "@/lib/vocabulary/kinds";
import { listVocabulary } from "@/lib/vocabulary/queries";

export const metadata: Metadata = { title: "Vocabulary" };

// What a marked region can say, as everyone may read it; editors change it here.
export default async function VocabularyPage() {
  const actor = await currentActor();
  const editor = can(actor, "vocabulary.edit");
  const aspects = await listVocabulary(actor, { withUsage: editor });
  return (
    <>
      <PageTitle
        title="Vocabulary"
        lead="The words observations are recorded in. Each aspect is one kind of evidence a marked region can carry; its value is a term from the list, a count or a short text. Deprecated entries stay so that older observations keep their words, but new observations cannot use them."
      />
      {editor && (
        <details className="mb-8 rounded border border-rule bg-card p-4">
          <summary className="cursor-pointer font-semibold">Add an aspect</summary>
          <div className="mt-3">
            <AspectForm />
          </div>
        </details>
      )}
      {ASPECT_SECTIONS.map((section) => {
        const list = aspects.filter((a) => a.section === section);
        const order = list.map((a) => ({ id: a.id, version: a.version }));
        return (
          <section key={section} aria-labelledby={`section-${section}`} className="mb-10">
            <h2 id={`section-${section}`} className="mb-3 text-2xl">
              {SECTION_LABELS[section]}
            </h2>
            {list.length === 0 ? (
              <p className="text-sm text-ink-soft">No aspects in this section yet.</p>
            ) : (
              <div className="grid gap-4">
                {list.map((aspect) => (
                  <AspectEntry key={aspect.id} aspect={aspect} order={order} editable={editor} />
                ))}
              </div>
            )}
          </section>
        );
      })}
    </>
  );
}
