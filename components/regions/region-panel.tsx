"use client";

// The panel beside the photograph: what is marked on it, the selected region's editor, and the
// commands that apply to all of one's regions here (undo, propose all). Readers see vetted evidence,
// and may ask to see proposed work too, marked as not yet reviewed.
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { RegionEditor } from "./region-editor";
import { RegionList, regionName } from "./region-list";
import { SaveStatus } from "./save-status";
import { SourceStringing } from "./source-stringing";
import { useVocabulary } from "./use-vocabulary";
import type { RegionWorkspace } from "./use-region-workspace";

type Props = { imageId: number; sourceId: number; workspace: RegionWorkspace; canDraw: boolean; canSeeProposed: boolean; viewerId: number | null };

export function RegionPanel({ imageId, sourceId, workspace, canDraw, canSeeProposed, viewerId }: Props) {
  const vocabulary = useVocabulary();
  const { drafts, selected, list, actions, saver, undo } = workspace;
  const index = selected ? drafts.indexOf(selected) : -1;
  const mine = drafts.filter((d) => d.view.authorId === viewerId);
  return (
    <section aria-labelledby="regions-heading" className="grid content-start gap-3 text-sm">
      <h2 id="regions-heading" className="text-xl">
        Evidence on this photograph
      </h2>
      {canSeeProposed ? (
        <label className="inline-flex items-center gap-2">
          <input type="checkbox" checked={workspace.proposed} onChange={(e) => workspace.setProposed(e.target.checked)} className="accent-accent" />
          Show proposed evidence (not yet reviewed)
        </label>
      ) : (
        <p className="text-ink-faint">Vetted evidence only. Sign in to see evidence proposed but not yet reviewed.</p>
      )}
      {canDraw && (
        <div className="flex flex-wrap items-center gap-2">
          <Button type="button" variant="quiet" disabled={undo.size === 0 && !saver.busy()} onClick={() => void actions.undoLast()} aria-keyshortcuts="Control+Z Meta+Z">
            Undo
          </Button>
          {mine.some((d) => d.view.can.propose) && (
            <Button type="button" variant="quiet" disabled={actions.working} onClick={() => void actions.proposeMine()}>
              Propose all my regions on this photograph
            </Button>
          )}
          <SaveStatus drafts={drafts} onRetry={(id) => void saver.retry(id)} />
        </div>
      )}
      {actions.notice && <Notice tone={actions.notice.tone}>{actions.notice.text}</Notice>}
      {list.error ? (
        <Notice tone="warn">The regions could not be loaded: {list.error.message}</Notice>
      ) : list.loading ? (
        <p className="text-ink-faint">Loading the regions…</p>
      ) : drafts.length === 0 ? (
        <p className="text-ink-faint">{canDraw ? "No regions yet. Choose Rectangle or Polygon and mark the evidence on the photograph." : "No vetted evidence is marked on this photograph yet."}</p>
      ) : (
        <RegionList
          imageId={imageId}
          drafts={drafts}
          selectedId={workspace.selectedId}
          vocabulary={vocabulary}
          viewerIsAuthor={(d) => d.view.authorId === viewerId}
          onSelect={workspace.select}
        />
      )}
      {vocabulary.error && <Notice tone="warn">The list of aspects could not be loaded: {vocabulary.error.message}</Notice>}
      {selected && <RegionEditor draft={selected} name={regionName(selected, index)} canDraw={canDraw} vocabulary={vocabulary} saver={saver} actions={actions} />}
      <SourceStringing sourceId={sourceId} proposed={workspace.proposed} />
    </section>
  );
}
