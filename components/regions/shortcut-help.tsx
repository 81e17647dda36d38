// The keys of the viewer, written out under it. Zoom and pan are OpenSeadragon's own keys (the canvas
// must have the focus); the others work anywhere on the page outside a text field.

const Key = ({ children }: { children: string }) => <kbd className="rounded border border-rule bg-card px-1 font-mono text-xs">{children}</kbd>;

export function ShortcutHelp({ id, canDraw }: { id: string; canDraw: boolean }) {
  return (
    <div id={id} className="mt-2 text-sm text-ink-faint">
      <p>
        Keyboard: click the photograph or move to it with Tab, then <Key>+</Key> and <Key>−</Key> zoom, the arrow keys move,{" "}
        <Key>0</Key> goes back to the whole picture; the mouse wheel zooms too. <Key>[</Key> and <Key>]</Key> rotate by a quarter turn.{" "}
        <Key>N</Key> or <Key>J</Key> selects the next region, <Key>Shift N</Key> or <Key>K</Key> the previous one.
      </p>
      {canDraw && (
        <p className="mt-1">
          Drawing: <Key>V</Key> or <Key>Esc</Key> select and move, <Key>R</Key> rectangle, <Key>P</Key> polygon; <Key>Esc</Key> also
          abandons a polygon half drawn, or clears the selection. <Key>Delete</Key> or <Key>Backspace</Key> deletes the selected region of yours,{" "}
          <Key>Ctrl Z</Key> (<Key>⌘ Z</Key> on a Mac) undoes your last change.
        </p>
      )}
    </div>
  );
}
