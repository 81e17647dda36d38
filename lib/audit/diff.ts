// The fields that differ between two records, for history lines ("title, dating changed").
const IGNORED = new Set(["version", "updatedAt", "createdAt", "id"]);

export function changedFields(before: unknown, after: unknown): string[] {
  const b = (before ?? {}) as Record<string, unknown>;
  const a = (after ?? {}) as Record<string, unknown>;
  return [...new Set([...Object.keys(b), ...Object.keys(a)])].filter((k) => !IGNORED.has(k) && JSON.stringify(b[k]) !== JSON.stringify(a[k]));
}
