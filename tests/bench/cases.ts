// The list-query shapes measured: what the archive page asks for, by whom.
import type { Actor } from "../../lib/auth/policy";
import { BENCH_USERS } from "./generate";

export type Who = "visitor" | "contributor" | "editor" | "admin";
export type ListCase = { id: string; label: string; who: Who; query: Record<string, string | number> };
export type WalkCase = ListCase & { hops: number };

export const ACTORS: Record<Who, Actor | null> = {
  visitor: null,
  contributor: { id: BENCH_USERS.contributor, role: "contributor", email: "bench.user07@cordarium.test", name: "Bench contributor" },
  editor: { id: BENCH_USERS.editor, role: "editor", email: "bench.user02@cordarium.test", name: "Bench editor" },
  admin: { id: BENCH_USERS.admin, role: "admin", email: "bench.user01@cordarium.test", name: "Bench admin" },
};

const PERIOD = { from: "1620", to: "1700" };

export const CASES: ListCase[] = [
  { id: "title", label: "first page, by title", who: "visitor", query: {} },
  { id: "title-editor", label: "first page, by title", who: "editor", query: {} },
  { id: "title-contributor", label: "first page, by title (published or own)", who: "contributor", query: {} },
  { id: "dating-desc", label: "by dating, latest first", who: "visitor", query: { sort: "dating", dir: "desc" } },
  { id: "created-desc-editor", label: "newest first", who: "editor", query: { sort: "created", dir: "desc" } },
  { id: "country-it", label: "country IT (24 %)", who: "visitor", query: { country: "IT" } },
  { id: "country-dk", label: "country DK (1 %)", who: "visitor", query: { country: "DK" } },
  { id: "type-painting", label: "object type painting (40 %)", who: "visitor", query: { objectType: "painting" } },
  { id: "type-tile", label: "object type tile (3 %)", who: "visitor", query: { objectType: "tile" } },
  { id: "dates", label: "dated 1620–1700 (overlap)", who: "visitor", query: PERIOD },
  { id: "dates-editor", label: "dated 1620–1700 (overlap)", who: "editor", query: PERIOD },
  { id: "combined", label: "IT + painting + 1620–1700", who: "visitor", query: { country: "IT", objectType: "painting", ...PERIOD } },
  { id: "combined-dating", label: "IT + painting + 1620–1700, by dating", who: "visitor", query: { country: "IT", objectType: "painting", ...PERIOD, sort: "dating" } },
  { id: "collection", label: "one collection", who: "visitor", query: { collection: 17 } },
  { id: "text", label: "text “lute” (LIKE %…%)", who: "visitor", query: { q: "lute" } },
  { id: "deleted-admin", label: "deleted only (0.5 %)", who: "admin", query: { deleted: "only" } },
];

export const WALKS: WalkCase[] = [
  { id: "walk-title", label: "by title", who: "visitor", query: {}, hops: 200 },
  { id: "walk-dating-desc", label: "by dating, latest first", who: "visitor", query: { sort: "dating", dir: "desc" }, hops: 200 },
  { id: "walk-country-it", label: "country IT, by title", who: "visitor", query: { country: "IT" }, hops: 200 },
];
