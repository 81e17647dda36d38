// Folding for place-name matching: case and accents do not matter ("Köln" = "koln", "Sevilla" = "sevilla").
// Letters that Unicode does not decompose are spelled out as their usual Latin transliteration.
const SPECIAL: Record<string, string> = { ß: "ss", æ: "ae", œ: "oe", ø: "o", đ: "d", ð: "d", þ: "th", ł: "l", ı: "i" };

export function foldName(name: string): string {
  return name
    .toLowerCase()
    .normalize("NFD")
    .replace(/\p{M}+/gu, "")
    .replace(/[ßæœøđðþłı]/g, (c) => SPECIAL[c] ?? c)
    .replace(/[’'`]/g, "'")
    .replace(/\s+/g, " ")
    .trim();
}
