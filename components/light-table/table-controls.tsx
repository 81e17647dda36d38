"use client";

// The light table's controls: the common height, one zoom for every crop, back to the whole crops, and
// the table's link. Hidden in print.
import { useId, useState, type ReactNode } from "react";
import { CROP_HEIGHTS, CROP_SIZE_WORDS, CROP_SIZES, type CropSize } from "@/lib/light-table/links";
import { MAX_ZOOM, MIN_ZOOM, type SharedView } from "@/lib/light-table/view";

type Props = {
  size: CropSize;
  onSize(size: CropSize): void;
  view: SharedView;
  onZoomIn(): void;
  onZoomOut(): void;
  onZoom(zoom: number): void;
  onReset(): void;
  hintId: string;
  /** More commands at the end of the bar (the selection, saving as a dossier). */
  children?: ReactNode;
};

const tool = "rounded border border-rule bg-card px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-60";

export function TableControls({ size, onSize, view, onZoomIn, onZoomOut, onZoom, onReset, hintId, children }: Props) {
  const sliderId = useId();
  return (
    <div className="mb-6 space-y-3 rounded border border-rule bg-card p-3 print:hidden">
      <div role="toolbar" aria-label="Light table controls" className="flex flex-wrap items-center gap-x-6 gap-y-3">
        <fieldset className="flex items-center gap-1">
          <legend className="sr-only">Crop height</legend>
          <span aria-hidden="true" className="mr-1 text-sm font-semibold text-ink-soft">
            Height
          </span>
          {CROP_SIZES.map((s) => (
            <label key={s} className={`cursor-pointer rounded border px-2.5 py-1 text-sm has-[:focus-visible]:ring-3 has-[:focus-visible]:ring-accent ${s === size ? "border-accent bg-accent-wash font-semibold text-accent-deep" : "border-rule"}`}>
              <input type="radio" name="crop-height" value={s} checked={s === size} onChange={() => onSize(s)} className="sr-only" />
              {CROP_SIZE_WORDS[s]} <span className="text-ink-faint">{CROP_HEIGHTS[s]} px</span>
            </label>
          ))}
        </fieldset>
        <div className="flex items-center gap-2">
          <button type="button" className={tool} onClick={onZoomOut} disabled={view.zoom <= MIN_ZOOM} aria-label="Zoom out">
            −
          </button>
          <label htmlFor={sliderId} className="text-sm font-semibold text-ink-soft">
            Zoom
          </label>
          <input
            id={sliderId}
            type="range"
            min={MIN_ZOOM}
            max={MAX_ZOOM}
            step={0.1}
            value={view.zoom}
            onChange={(e) => onZoom(Number(e.target.value))}
            aria-valuetext={`${view.zoom.toFixed(1)} times`}
            className="w-32 accent-accent"
          />
          <output htmlFor={sliderId} className="w-12 font-mono text-sm" data-testid="zoom-value">
            {view.zoom.toFixed(1)}×
          </output>
          <button type="button" className={tool} onClick={onZoomIn} disabled={view.zoom >= MAX_ZOOM} aria-label="Zoom in">
            +
          </button>
          <button type="button" className={tool} onClick={onReset}>
            Reset
          </button>
        </div>
        <CopyLink />
        {children}
      </div>
      <p id={hintId} className="text-sm text-ink-faint">
        Every crop follows the same zoom and position. On a crop: + and − zoom, the arrow keys move, 0 shows the whole crops; or drag the
        picture. Drag a crop by its handle, or use its Move buttons, to change the order; the link follows.
      </p>
    </div>
  );
}

/** Copies the table's address; where the clipboard is refused, offers it selected in a box instead. */
function CopyLink() {
  const [state, setState] = useState<"idle" | "copied" | "manual">("idle");
  const [href, setHref] = useState("");
  const copy = async () => {
    const url = window.location.href;
    setHref(url);
    try {
      await navigator.clipboard.writeText(url);
      setState("copied");
    } catch {
      setState("manual");
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <button type="button" className={tool} onClick={copy}>
        Copy link
      </button>
      <span aria-live="polite" className="text-sm text-ink-soft">
        {state === "copied" && "Link copied."}
      </span>
      {state === "manual" && (
        <label className="flex items-center gap-2 text-sm">
          Copy this link:
          <input readOnly value={href} onFocus={(e) => e.currentTarget.select()} autoFocus className="w-72 rounded border border-rule bg-paper px-2 py-1 font-mono text-xs" />
        </label>
      )}
    </div>
  );
}
