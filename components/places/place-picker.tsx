"use client";

// PlacePicker: choose a place (a gazetteer city or a historical area) by typing the start of its name.
//
// Props (other forms depend on them; keep them stable):
//   label     visible label of the text box
//   value     the chosen place, or null
//   onChange  called with the place chosen, or with null when the choice is cleared or the text edited
//   name      when given, a hidden input of that name carries the chosen id ("" for none), for plain forms
//   errors    the server's messages for this field, shown under the box
//   country   ISO 3166-1 alpha-2 code: suggest only places in that country
//
// It follows the WAI-ARIA Authoring Practices combobox pattern with list autocomplete: the input has
// role=combobox, the suggestions are a listbox, focus stays in the input and the active option is
// named by aria-activedescendant. Down/Up move, Enter chooses, Escape closes.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useEffect, useId, useRef, useState, type KeyboardEvent } from "react";
import { inputClass } from "@/components/ui/field";
import { api } from "@/lib/client/api";
import { placeLine } from "@/lib/places/format";
import type { PlaceSuggestion } from "@/lib/places/schemas";

export type PlaceChoice = PlaceSuggestion;

export type PlacePickerProps = {
  label: string;
  value: PlaceChoice | null;
  onChange(place: PlaceChoice | null): void;
  name?: string;
  errors?: string[];
  country?: string;
};

// Long enough to skip the keystrokes of a fluent typist, short enough to feel immediate.
const DEBOUNCE_MS = 200;

function useDebounced<T>(value: T, ms: number): T {
  const [debounced, setDebounced] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setDebounced(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return debounced;
}

function statusText(typed: string, found: number, fetching: boolean, error: Error | null): string {
  if (error) return error.message;
  if (found === 0) return fetching ? "Looking up places…" : `No place starts with “${typed}”.`;
  return `${found} place${found === 1 ? "" : "s"} found; use the arrow keys to choose.`;
}

export function PlacePicker({ label, value, onChange, name, errors, country }: PlacePickerProps) {
  const id = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [text, setText] = useState(value?.name ?? "");
  const [shownId, setShownId] = useState<number | null>(value?.id ?? null);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);

  // When the parent sets or clears the value, the text follows it.
  if ((value?.id ?? null) !== shownId) {
    setShownId(value?.id ?? null);
    setText(value?.name ?? "");
  }

  const typed = useDebounced(text.trim(), DEBOUNCE_MS);
  const search = new URLSearchParams({ q: typed, limit: "10" });
  if (country) search.set("country", country);
  const query = useQuery({
    queryKey: ["places", typed, country ?? ""],
    queryFn: () => api<{ places: PlaceChoice[] }>(`/api/places?${search.toString()}`),
    enabled: open && typed.length > 0,
    placeholderData: keepPreviousData,
    staleTime: 5 * 60_000,
  });
  const results = text.trim() && typed ? (query.data?.places ?? []) : [];
  const expanded = open && results.length > 0;
  const activeIndex = active < results.length ? active : -1;
  const optionId = (i: number) => `${id}-option-${i}`;

  useEffect(() => {
    if (activeIndex >= 0) document.getElementById(`${id}-option-${activeIndex}`)?.scrollIntoView({ block: "nearest" });
  }, [activeIndex, id]);

  function edit(next: string) {
    setText(next);
    setOpen(true);
    setActive(-1);
    if (value) {
      setShownId(null);
      onChange(null);
    }
  }

  function choose(place: PlaceChoice) {
    setShownId(place.id);
    setText(place.name);
    setOpen(false);
    setActive(-1);
    onChange(place);
  }

  function clear() {
    setShownId(null);
    setText("");
    setOpen(false);
    setActive(-1);
    if (value) onChange(null);
    inputRef.current?.focus();
  }

  function onKeyDown(e: KeyboardEvent<HTMLInputElement>) {
    const n = results.length;
    if (e.key === "ArrowDown" || e.key === "ArrowUp") {
      e.preventDefault();
      setOpen(true);
      if (n === 0) return;
      const down = e.key === "ArrowDown";
      setActive(activeIndex < 0 ? (down ? 0 : n - 1) : (activeIndex + (down ? 1 : n - 1)) % n);
    } else if (e.key === "Enter" && expanded && activeIndex >= 0) {
      e.preventDefault(); // choosing must not submit the surrounding form
      choose(results[activeIndex]);
    } else if (e.key === "Escape") {
      if (expanded) {
        e.preventDefault();
        setOpen(false);
        setActive(-1);
      } else if (!value && text) {
        setText("");
      }
    }
  }

  const status = !open || !typed ? "" : statusText(typed, results.length, query.isFetching, query.error);
  const describedBy = [errors?.length ? `${id}-error` : "", `${id}-status`].filter(Boolean).join(" ");

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={`${id}-input`} className="text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <div className="relative">
        <input
          ref={inputRef}
          id={`${id}-input`}
          type="text"
          role="combobox"
          aria-autocomplete="list"
          aria-expanded={expanded}
          aria-controls={`${id}-listbox`}
          aria-activedescendant={expanded && activeIndex >= 0 ? optionId(activeIndex) : undefined}
          aria-invalid={errors?.length ? true : undefined}
          aria-describedby={describedBy}
          autoComplete="off"
          spellCheck={false}
          value={text}
          onChange={(e) => edit(e.target.value)}
          onKeyDown={onKeyDown}
          onBlur={() => setOpen(false)}
          className={`${inputClass} pr-10`}
        />
        {(text || value) && (
          <button
            type="button"
            aria-label={`Clear ${label}`}
            onClick={clear}
            className="absolute right-1 top-1/2 -translate-y-1/2 rounded px-2 py-0.5 text-lg leading-none text-ink-soft hover:bg-paper-deep"
          >
            ×
          </button>
        )}
        <ul
          id={`${id}-listbox`}
          role="listbox"
          aria-label={label}
          hidden={!expanded}
          // Keeps focus in the input when an option is clicked.
          onMouseDown={(e) => e.preventDefault()}
          className="absolute z-20 mt-1 max-h-72 w-full overflow-auto rounded border border-rule bg-card py-1 shadow-lg"
        >
          {results.map((place, i) => (
            <li
              key={place.id}
              id={optionId(i)}
              role="option"
              aria-selected={i === activeIndex}
              onClick={() => choose(place)}
              onMouseMove={() => setActive(i)}
              className="flex cursor-pointer items-center justify-between gap-3 px-3 py-2 text-sm aria-selected:bg-accent-wash"
            >
              <span>{placeLine(place)}</span>
              {place.kind === "area" && (
                <span className="shrink-0 rounded border border-accent px-1.5 text-xs font-semibold text-accent-deep">area</span>
              )}
            </li>
          ))}
        </ul>
      </div>
      {name && <input type="hidden" name={name} value={value?.id ?? ""} />}
      <p id={`${id}-status`} aria-live="polite" className={results.length ? "sr-only" : "text-sm text-ink-faint"}>
        {status}
      </p>
      {errors?.length ? (
        <p id={`${id}-error`} className="text-sm text-warn">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
