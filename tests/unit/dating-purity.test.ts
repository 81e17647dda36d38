// The dating module runs in the browser too (the form reads a dating while it is typed), so it
// may import only its own files and the `edtf` package — nothing Node-specific, no server-only.
import { readFileSync, readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const dir = fileURLToPath(new URL("../../lib/dating/", import.meta.url));
const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));

describe("lib/dating imports", () => {
  it.each(files)("%s imports only ./files and edtf", (file) => {
    const source = readFileSync(dir + file, "utf8");
    const specifiers = [...source.matchAll(/\bfrom\s+"([^"]+)"|\bimport\s+"([^"]+)"/g)].map((m) => m[1] ?? m[2]);
    for (const specifier of specifiers) {
      expect(specifier === "edtf" || specifier.startsWith("./"), `${file} imports ${specifier}`).toBe(true);
    }
  });
});
