import type { KeyboardEvent, MouseEvent, ReactNode } from "react";

type Props = {
  /** What the mark is, read by screen readers and shown as the tooltip. */
  label: string;
  /** Added to the accessible name of a link or button: what following it does. */
  action?: string;
  href?: string;
  onSelect?: () => void;
  children: ReactNode;
};

// One bar or place of a chart: a link when the page gives an href (works without JavaScript),
// a button when it gives only a callback, otherwise a plain group with its tooltip. Callbacks
// need a client component above; links work from a server component.
export function ChartMark({ label, action, href, onSelect, children }: Props) {
  const name = action ? `${label}. ${action}` : label;
  if (href) {
    const onClick = onSelect
      ? (e: MouseEvent) => {
          if (e.button !== 0 || e.metaKey || e.ctrlKey || e.shiftKey || e.altKey) return;
          e.preventDefault();
          onSelect();
        }
      : undefined;
    return (
      <a href={href} aria-label={name} className="group" onClick={onClick}>
        <title>{label}</title>
        {children}
      </a>
    );
  }
  if (onSelect) {
    const onKeyDown = (e: KeyboardEvent) => {
      if (e.key !== "Enter" && e.key !== " ") return;
      e.preventDefault();
      onSelect();
    };
    return (
      <g role="button" tabIndex={0} aria-label={name} className="group cursor-pointer" onClick={onSelect} onKeyDown={onKeyDown}>
        <title>{label}</title>
        {children}
      </g>
    );
  }
  return (
    <g>
      <title>{label}</title>
      {children}
    </g>
  );
}
