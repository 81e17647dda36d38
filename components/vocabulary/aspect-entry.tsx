// One aspect as everyone sees it: its label, key, what its value is, its description and its terms.
// Editors also see how many observations use each, and get the controls.
import type { ReactNode } from "react";
import { KIND_LABELS } from "@/lib/vocabulary/kinds";
import type { AspectView, TermView } from "@/lib/vocabulary/types";
import { AspectActions } from "./aspect-actions";
import { TermActions } from "./term-actions";

const usagePhrase = (n: number) => (n === 0 ? "unused" : `used in ${n} observation${n === 1 ? "" : "s"}`);

function Flag({ children }: { children: ReactNode }) {
  return <span className="rounded border border-rule bg-paper-deep px-1.5 py-0.5 text-xs font-semibold text-ink-soft">{children}</span>;
}

function TermLine({ term, aspect, editable }: { term: TermView; aspect: AspectView; editable: boolean }) {
  const into = term.mergedIntoId ? aspect.terms.find((t) => t.id === term.mergedIntoId) : undefined;
  const candidates = aspect.terms.filter((t) => t.id !== term.id && !t.deprecated).map((t) => ({ id: t.id, label: t.label }));
  const words = (
    <>
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <span className="font-semibold">{term.label}</span>
        <code className="font-mono text-xs text-ink-faint">{term.key}</code>
        {into ? <Flag>merged into {into.label}</Flag> : term.deprecated && <Flag>deprecated</Flag>}
        {editable && term.usage !== undefined && <span className="text-xs text-ink-soft">{usagePhrase(term.usage)}</span>}
      </div>
      {term.description && <p className="text-sm">{term.description}</p>}
    </>
  );
  return (
    <li className={`border-t border-rule py-2 ${term.deprecated ? "text-ink-soft" : ""}`}>
      {editable ? (
        <TermActions term={term} aspect={{ id: aspect.id, label: aspect.label }} order={aspect.terms.map((t) => ({ id: t.id, version: t.version }))} candidates={candidates}>
          {words}
        </TermActions>
      ) : (
        words
      )}
    </li>
  );
}

export function AspectEntry({ aspect, order, editable }: { aspect: AspectView; order: { id: number; version: number }[]; editable: boolean }) {
  const headingId = `aspect-${aspect.key}`;
  return (
    <article aria-labelledby={headingId} className={`rounded border border-rule bg-card p-4 ${aspect.deprecated ? "opacity-80" : ""}`}>
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h3 id={headingId} className="font-serif text-xl">
          {aspect.label}
        </h3>
        <code className="font-mono text-xs text-ink-faint">{aspect.key}</code>
        {aspect.deprecated && <Flag>deprecated</Flag>}
        <span className="text-sm text-ink-soft">Value: {KIND_LABELS[aspect.kind]}</span>
        {editable && aspect.usage !== undefined && <span className="text-xs text-ink-soft">{usagePhrase(aspect.usage)}</span>}
      </div>
      {aspect.description && <p className="mt-1 text-sm">{aspect.description}</p>}
      {aspect.kind === "terms" && aspect.terms.length > 0 && (
        <ul aria-label={`Terms of ${aspect.label}`} className="mt-2">
          {aspect.terms.map((term) => (
            <TermLine key={term.id} term={term} aspect={aspect} editable={editable} />
          ))}
        </ul>
      )}
      {editable && <AspectActions aspect={aspect} order={order} />}
    </article>
  );
}
