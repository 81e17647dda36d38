"use client";

// The selected region in full: its label and observations (editable when it is the viewer's own),
// who marked it, and the review actions open to the viewer: propose, withdraw, delete.
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { RegionConflict } from "./region-conflict";
import { RegionStateBadge } from "./region-state-badge";
import { ObservationEditor } from "./observation-editor";
import type { RegionActions } from "./use-region-actions";
import type { RegionSaver } from "./use-region-saver";
import type { Vocabulary } from "./use-vocabulary";
import type { RegionDraft } from "./use-region-workspace";

type Props = { draft: RegionDraft; name: string; canDraw: boolean; vocabulary: Vocabulary; saver: RegionSaver; actions: RegionActions };

export function RegionEditor({ draft, name, canDraw, vocabulary, saver, actions }: Props) {
  const { view } = draft;
  const id = view.id;
  const editable = canDraw && view.can.edit;
  return (
    <section aria-labelledby="region-editor-heading" data-testid="region-editor" className="grid gap-3 rounded border border-accent bg-card p-3">
      <header className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="region-editor-heading" className="text-xl">
          {name}
        </h3>
        <RegionStateBadge state={view.state} />
      </header>
      <p className="text-xs text-ink-faint">
        Marked by {view.authorName} · version {view.versionNumber}
        {view.shown === "vetted" ? " (the vetted version)" : ""}
        {view.state === "vetted" && editable ? ". Editing starts a new version; readers keep seeing the vetted one until it is vetted." : ""}
      </p>
      {draft.conflict && (
        <RegionConflict conflict={draft.conflict} vocabulary={vocabulary} onLoadTheirs={() => saver.loadTheirs(id)} onKeepMine={() => saver.keepMine(id)} />
      )}
      {editable ? (
        <label className="grid gap-1 text-sm">
          <span className="font-semibold text-ink-soft">Label</span>
          <input
            type="text"
            maxLength={200}
            className={`${inputClass} py-1 text-sm`}
            placeholder="e.g. right hand, pegbox"
            value={draft.label ?? ""}
            onChange={(e) => saver.edit(id, { label: e.target.value || null })}
          />
        </label>
      ) : null}
      <ObservationEditor observations={draft.observations} vocabulary={vocabulary} editable={editable} onChange={(observations) => saver.edit(id, { observations })} />
      {canDraw && (view.can.propose || view.can.withdraw || view.can.delete) && (
        <div className="flex flex-wrap gap-2 border-t border-rule pt-3">
          {view.can.propose && (
            <Button type="button" disabled={actions.working || Boolean(draft.conflict) || draft.observations.length === 0} onClick={() => void actions.propose(id)}>
              Propose
            </Button>
          )}
          {view.can.withdraw && (
            <Button type="button" variant="quiet" disabled={actions.working} onClick={() => void actions.withdraw(id)}>
              Withdraw
            </Button>
          )}
          {view.can.delete && (
            <Button type="button" variant="danger" disabled={actions.working} onClick={() => void actions.deleteOne(id)}>
              Delete region
            </Button>
          )}
        </div>
      )}
      {canDraw && view.can.propose && draft.observations.length === 0 && <p className="text-xs text-ink-faint">Record at least one observation before proposing the region for review.</p>}
    </section>
  );
}
