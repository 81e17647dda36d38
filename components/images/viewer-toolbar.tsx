"use client";

import type { ReactNode } from "react";

// Our own labelled buttons over the deep-zoom canvas, with the zoom and rotation read out in numbers.

export type ViewerCommand = "zoom-in" | "zoom-out" | "rotate-left" | "rotate-right" | "reset" | "full-screen";

type Props = {
  enabled: boolean;
  /** Percent of the photograph's own pixels: 100 = one image pixel per screen pixel. */
  zoomPercent: number | null;
  rotation: number;
  fullScreen: boolean;
  onCommand(command: ViewerCommand): void;
};

function Tool({ label, onClick, disabled, children }: { label: string; onClick(): void; disabled: boolean; children: ReactNode }) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      className="inline-flex items-center gap-1.5 rounded border border-rule bg-card px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-60"
    >
      <span aria-hidden="true" className="font-mono text-base leading-none text-accent">
        {children}
      </span>
      {label}
    </button>
  );
}

/** Small zooms need a decimal to show that anything changed; large ones do not. */
const formatZoom = (p: number) => (p < 10 ? p.toFixed(1) : Math.round(p).toString());
/** Rotation in 0–359°, however many turns were made. */
const formatRotation = (deg: number) => `${((Math.round(deg) % 360) + 360) % 360}°`;

export function ViewerToolbar({ enabled, zoomPercent, rotation, fullScreen, onCommand }: Props) {
  const off = !enabled;
  return (
    <div role="toolbar" aria-label="Viewer controls" className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper px-3 py-2">
      <Tool label="Zoom in" disabled={off} onClick={() => onCommand("zoom-in")}>
        +
      </Tool>
      <Tool label="Zoom out" disabled={off} onClick={() => onCommand("zoom-out")}>
        −
      </Tool>
      <Tool label="Rotate left" disabled={off} onClick={() => onCommand("rotate-left")}>
        ↺
      </Tool>
      <Tool label="Rotate right" disabled={off} onClick={() => onCommand("rotate-right")}>
        ↻
      </Tool>
      <Tool label="Reset view" disabled={off} onClick={() => onCommand("reset")}>
        ⌂
      </Tool>
      <Tool label={fullScreen ? "Leave full screen" : "Full screen"} disabled={off} onClick={() => onCommand("full-screen")}>
        ⤢
      </Tool>
      <p className="ml-auto flex gap-4 text-sm text-ink-soft">
        <span title="100 % shows one pixel of the photograph on one pixel of the screen">
          Zoom{" "}
          <span className="font-mono text-ink" data-testid="zoom-level">
            {zoomPercent === null ? "–" : `${formatZoom(zoomPercent)} %`}
          </span>
        </span>
        <span>
          Rotation{" "}
          <span className="font-mono text-ink" data-testid="rotation">
            {formatRotation(rotation)}
          </span>
        </span>
      </p>
    </div>
  );
}
