"use client";

// The keyboard commands of the evidence viewer, listened for on the whole document in the capture
// phase: they work wherever the focus is (the canvas, the list, a button) except in a text field,
// and a key we act on is stopped there, before OpenSeadragon's own handler or the drawing layer's
// can act on it too (see region-tools.ts for which keys, and why).
import { useEffect, useRef } from "react";
import { commandFor, isTypingTarget, type RegionCommand } from "./region-tools";

export function useRegionShortcuts(canDraw: boolean, run: (command: RegionCommand) => boolean) {
  const latest = useRef(run);
  useEffect(() => {
    latest.current = run;
  });

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || e.repeat || isTypingTarget(e.target)) return;
      // A dialog or menu open over the page keeps its keys.
      if (e.target instanceof Element && e.target.closest("dialog, [role='dialog'], [role='menu'], details[open]")) return;
      const command = commandFor(e, canDraw);
      if (command && latest.current(command)) {
        e.preventDefault();
        e.stopPropagation();
      }
    };
    document.addEventListener("keydown", onKey, true);
    return () => document.removeEventListener("keydown", onKey, true);
  }, [canDraw]);
}
