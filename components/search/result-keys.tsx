"use client";
// Arrow keys move the focus between results (in the grid, by row and column as drawn); Enter opens
// the focused one, as links do.
import { useRef, type KeyboardEvent, type ReactNode } from "react";

export function ResultKeys({ children, className }: { children: ReactNode; className?: string }) {
  const ref = useRef<HTMLDivElement>(null);
  function onKeyDown(e: KeyboardEvent<HTMLDivElement>) {
    const moves: Record<string, "left" | "right" | "up" | "down"> = { ArrowLeft: "left", ArrowRight: "right", ArrowUp: "up", ArrowDown: "down" };
    const move = moves[e.key];
    if (!move || !ref.current) return;
    const links = [...ref.current.querySelectorAll<HTMLAnchorElement>("a[data-result]")];
    const at = links.indexOf(document.activeElement as HTMLAnchorElement);
    if (at < 0) return;
    // Columns are counted from where the results are laid out, so the keys follow the grid at any width.
    const top = links[0].getBoundingClientRect().top;
    const columns = Math.max(1, links.filter((l) => Math.abs(l.getBoundingClientRect().top - top) < 4).length);
    const step = { left: -1, right: 1, up: -columns, down: columns }[move];
    const target = links[at + step];
    if (target) {
      e.preventDefault();
      target.focus();
    }
  }
  return (
    <div ref={ref} onKeyDown={onKeyDown} className={className}>
      {children}
    </div>
  );
}
