"use client";
// The instant search box: as the reader types, the address is replaced (so the search can be shared
// and the server page redraws results, facets and charts) and the number of matches is fetched at once.
import { useQuery } from "@tanstack/react-query";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useRef, useState, useTransition } from "react";
import { api } from "@/lib/client/api";

const DELAY_MS = 250;

export function SearchBox({ initial }: { initial: string }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const [text, setText] = useState(initial);
  const [debounced, setDebounced] = useState(initial);
  const [pending, startTransition] = useTransition();

  useEffect(() => {
    const t = setTimeout(() => setDebounced(text.trim()), DELAY_MS);
    return () => clearTimeout(t);
  }, [text]);

  const next = new URLSearchParams(params.toString());
  if (debounced) next.set("q", debounced);
  else next.delete("q");
  next.delete("page");
  const qs = next.toString();

  // The words this box put into the address itself; any other value arrived by a link, the back
  // button or the header's search link, and the box then shows that instead of what was typed.
  const asked = useRef<string[]>([initial]);
  const urlWords = params.get("q") ?? "";
  useEffect(() => {
    if (asked.current.includes(urlWords)) return;
    asked.current = [urlWords];
    setText(urlWords);
    setDebounced(urlWords);
  }, [urlWords]);

  useEffect(() => {
    if (urlWords === debounced) return;
    asked.current = [...asked.current.slice(-4), debounced];
    startTransition(() => router.replace(qs ? `${pathname}?${qs}` : pathname, { scroll: false }));
    // Only a change of the words starts a new search; the rest of the address is read as it is.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [debounced]);

  const count = useQuery({
    queryKey: ["search-count", qs],
    queryFn: () => api<{ total: number }>(`/api/search?${new URLSearchParams([...next, ["perPage", "1"]]).toString()}`),
    placeholderData: (previous) => previous,
  });

  return (
    <form role="search" action="/search" onSubmit={(e) => { e.preventDefault(); setDebounced(text.trim()); }} className="flex flex-wrap items-center gap-3">
      <label htmlFor="search-q" className="sr-only">Search the evidence</label>
      <input
        id="search-q"
        name="q"
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        placeholder="Words: a technique, an instrument, a painter, a place…"
        autoComplete="off"
        className="min-w-0 flex-1 rounded border border-rule bg-card px-3 py-2 text-lg"
      />
      {[...params].filter(([k]) => k !== "q" && k !== "page").map(([k, v], i) => (
        <input key={`${k}-${i}`} type="hidden" name={k} value={v} />
      ))}
      <p aria-live="polite" className="text-sm text-ink-soft" data-testid="live-count">
        {count.isError ? "Search is not answering." : count.data ? `${count.data.total} ${count.data.total === 1 ? "match" : "matches"}` : ""}
        {pending ? " · updating…" : ""}
      </p>
    </form>
  );
}
