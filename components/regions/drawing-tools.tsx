"use client";

// The three tools, as buttons that stay pressed: one is always on.
import { TOOLS, type RegionTool } from "./region-tools";

type Props = { tool: RegionTool; enabled: boolean; onTool(tool: RegionTool): void };

export function DrawingTools({ tool, enabled, onTool }: Props) {
  const current = TOOLS.find((t) => t.tool === tool)!;
  return (
    <div role="toolbar" aria-label="Drawing tools" className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper px-3 py-2">
      {TOOLS.map((t) => (
        <button
          key={t.tool}
          type="button"
          aria-pressed={t.tool === tool}
          aria-keyshortcuts={t.key}
          disabled={!enabled}
          onClick={() => onTool(t.tool)}
          className="inline-flex items-center gap-1.5 rounded border border-rule bg-card px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-60 aria-pressed:border-accent aria-pressed:bg-accent aria-pressed:text-white"
        >
          {t.label}
          <kbd className="font-mono text-xs opacity-75">{t.key}</kbd>
        </button>
      ))}
      <p className="ml-2 text-sm text-ink-soft" aria-live="polite">
        {current.hint}
      </p>
    </div>
  );
}
