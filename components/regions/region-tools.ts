// The drawing tools and the keys that reach them: one table, read by the toolbar, the key handler and
// the help text, so the three cannot disagree.

export type RegionTool = "select" | "rectangle" | "polygon";

export const TOOLS: { tool: RegionTool; label: string; key: string; hint: string }[] = [
  { tool: "select", label: "Select/move", key: "V", hint: "Drag moves the photograph; a click selects a region, whose outline and corners can then be dragged." },
  { tool: "rectangle", label: "Rectangle", key: "R", hint: "Press and drag across the evidence." },
  { tool: "polygon", label: "Polygon", key: "P", hint: "Click each corner; click the first point again, or double-click, to close." },
];

/**
 * What a key press asks for. Which letters: OpenSeadragon steers with + − 0, the arrows and W A S D,
 * rotates with R / Shift R, mirrors with F, and turns pages with J / K when the canvas has the focus.
 * We keep its zoom and pan keys, take R and Shift R for the rectangle when one may draw (rotation
 * moves to [ and ] for everyone, and the toolbar buttons stay), and take J and K for the next and previous region (this viewer shows one image, so
 * its page keys did nothing). Our handler runs in the document's capture phase and stops the keys it
 * uses, so OpenSeadragon never sees them. Mirroring is switched off altogether (see region-annotator):
 * a mirrored photograph would swap the player's hands.
 */
export type RegionCommand =
  | { kind: "tool"; tool: RegionTool }
  | { kind: "escape" }
  | { kind: "next" }
  | { kind: "previous" }
  | { kind: "delete" }
  | { kind: "undo" }
  | { kind: "rotate"; by: -90 | 90 };

export type KeyPress = { key: string; shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean };

export function commandFor(e: KeyPress, canDraw: boolean): RegionCommand | null {
  if (e.altKey) return null;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  if (e.ctrlKey || e.metaKey) return key === "z" && !e.shiftKey && canDraw ? { kind: "undo" } : null;
  if (key === "Escape") return { kind: "escape" };
  if (key === "[") return { kind: "rotate", by: -90 };
  if (key === "]") return { kind: "rotate", by: 90 };
  if ((key === "n" && !e.shiftKey) || key === "j") return { kind: "next" };
  if ((key === "n" && e.shiftKey) || key === "k") return { kind: "previous" };
  if (!canDraw) return null;
  if (key === "v") return { kind: "tool", tool: "select" };
  if (key === "r") return { kind: "tool", tool: "rectangle" };
  if (key === "p") return { kind: "tool", tool: "polygon" };
  if (key === "Delete" || key === "Backspace") return { kind: "delete" };
  return null;
}

const NOT_TYPED = new Set(["checkbox", "radio", "button", "submit", "reset", "image", "range", "color", "file"]);

/** Keys typed into a field (or steering a list box) are the field's, not ours; a radio button or a checkbox has none to lose. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!target || typeof (target as Element).closest !== "function") return false;
  const el = target as HTMLElement;
  if (el.isContentEditable || el.closest("textarea, select, [contenteditable='true']")) return true;
  const input = el.closest("input");
  return input !== null && !NOT_TYPED.has(input.type);
}
