// Word lists for the invented catalogue, and a seeded PRNG so that every run generates the same rows.
// All names are invented combinations; none is meant to describe a real work, artist or collection.
import type { AttributionQualifier, ObjectType } from "../../lib/sources/vocab";

/** mulberry32: small, fast and good enough to spread invented data. */
export function prng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (min: number, max: number) => min + Math.floor(next() * (max - min + 1));
  const pick = <T>(list: readonly T[]): T => list[Math.floor(next() * list.length)];
  const chance = (p: number) => next() < p;
  function weighted<T extends string>(weights: Readonly<Record<T, number>>): T {
    const entries = Object.entries(weights) as [T, number][];
    let r = next() * entries.reduce((s, [, w]) => s + w, 0);
    for (const [k, w] of entries) if ((r -= w) < 0) return k;
    return entries[entries.length - 1][0];
  }
  return { next, int, pick, chance, weighted };
}
export type Prng = ReturnType<typeof prng>;

export const PERFORMERS = [
  "Guitarist", "A Lute Player", "Lute Player", "A Young Woman Playing the Lute", "Woman Tuning a Lute",
  "A Cittern Player", "Boy with a Mandora", "Shepherd Playing a Guitar", "Two Musicians", "Musicians",
  "A Musical Company", "The Concert", "Merry Company", "Singer with a Theorbo", "Theorbo Player",
  "Old Man Playing a Cittern", "Gentleman with a Chitarrone", "Lady with a Gittern", "Girl with a Guitar",
  "Allegory of Hearing", "Saint Cecilia", "Orpheus Charming the Animals", "Apollo with a Lyre-Guitar",
  "The Prodigal Son", "Vanitas with a Lute", "Still Life with a Lute and Books", "A Serenade",
  "The Music Lesson", "A Duet", "Angel Playing a Lute", "Peasant with a Mandolin", "Soldier Playing a Cittern",
  "The Lovers", "A Woman Singing to the Lute", "Young Man with a Vihuela", "Portrait of a Lutenist",
  "Pastoral Concert", "Itinerant Musician", "A Courtesan with a Lute", "The Five Senses: Hearing",
] as const;

export const SETTINGS = [
  "in a Tavern", "at a Window", "in a Landscape", "in an Interior", "by a Fountain", "in a Garden",
  "on a Terrace", "before a Curtain", "at a Table", "under a Tree", "in a Kitchen", "at a Feast",
  "by Candlelight", "at Night", "with a Dog", "with Companions", "in a Loggia", "on a Balcony",
] as const;

const FIRST = [
  "Jan", "Pieter", "Giovanni", "Lucia", "Hendrick", "Judith", "Marcantonio", "Claude", "Adriaen", "Bartolomeo",
  "Caterina", "Willem", "Jacob", "Francesco", "Diego", "Mathieu", "Anna", "Cornelis", "Orazio", "Isabella",
  "Gerard", "Simon", "Luis", "Margarethe", "Hans", "Agostino", "Nicolas", "Juan", "Elisabetta", "Dirck",
] as const;
const LAST = [
  "van der Molen", "Castelli", "de Vries", "Moretti", "Leclerc", "Haverkamp", "Ortega", "Brandt", "Fiorentini",
  "Vermaes", "Duval", "Salviani", "ter Borch-Rijn", "Navarrete", "Kessler", "Albani", "Coorte-Laan", "Beaumont",
  "Valdés", "Hoogeveen", "Marchetti", "Pourbus-Aert", "Lindqvist", "Szabó", "Novák", "Ferreira", "Hartmann",
  "Rosselli", "Delacroix-Vey", "Aldegrever-Haas",
] as const;
const EPITHETS = ["", "", "", "", " the Elder", " the Younger", " II"] as const;
const NOTNAMES = ["Master of the Silver Lute", "Master of the Tavern Concerts", "Monogrammist HB", "Master of the Cittern Girl", "Master of the Window Serenades"] as const;

/** A fixed pool of invented artists; the same seed gives the same pool. */
export function artistPool(r: Prng, size: number): string[] {
  const names = new Set<string>();
  while (names.size < size) names.add(`${r.pick(FIRST)} ${r.pick(LAST)}${r.pick(EPITHETS)}`);
  return [...names, ...NOTNAMES];
}
export const notnames = NOTNAMES;

export const OBJECT_TYPE_WEIGHTS: Record<ObjectType, number> = {
  painting: 40, print: 24, drawing: 12, book_illustration: 10, sculpture: 5, tile: 3, textile: 2, other: 4,
};

export const QUALIFIER_WEIGHTS: Record<AttributionQualifier, number> = {
  by: 40, attributed_to: 15, workshop_of: 8, circle_of: 8, follower_of: 6, after: 8, anonymous: 15,
};

export const MEDIA: Record<ObjectType, readonly string[]> = {
  painting: ["Oil on canvas", "Oil on panel", "Oil on copper", "Tempera on panel"],
  drawing: ["Pen and brown ink", "Red chalk", "Black chalk on blue paper", "Pen and wash"],
  print: ["Engraving", "Etching", "Woodcut", "Mezzotint"],
  book_illustration: ["Woodcut", "Engraving", "Hand-coloured woodcut"],
  sculpture: ["Marble", "Bronze", "Limewood", "Terracotta"],
  tile: ["Tin-glazed earthenware"],
  textile: ["Wool and silk tapestry", "Silk embroidery"],
  other: ["Ivory", "Enamel on copper", "Boxwood"],
};

/** Share of the sources made in each country, and how many gazetteer places each contributes. */
export const COUNTRIES: Record<string, { sources: number; places: number }> = {
  IT: { sources: 24, places: 2000 }, NL: { sources: 16, places: 1000 }, BE: { sources: 9, places: 500 },
  FR: { sources: 11, places: 1200 }, ES: { sources: 9, places: 1000 }, DE: { sources: 10, places: 1200 },
  GB: { sources: 5, places: 700 }, AT: { sources: 3, places: 450 }, CZ: { sources: 2, places: 350 },
  PL: { sources: 2, places: 400 }, PT: { sources: 2, places: 300 }, CH: { sources: 2, places: 300 },
  DK: { sources: 1.5, places: 200 }, SE: { sources: 1.5, places: 200 }, HU: { sources: 2, places: 200 },
};

export const COLLECTION_NAMES: Record<string, readonly string[]> = {
  IT: ["Pinacoteca Civica di %", "Museo Civico di %", "Galleria Nazionale di %"],
  NL: ["Stedelijk Museum %", "Museum %", "Prentenkabinet %"],
  BE: ["Musée communal de %", "Stedelijk Museum %"],
  FR: ["Musée des Beaux-Arts de %", "Musée municipal de %"],
  ES: ["Museo de Bellas Artes de %", "Museo Municipal de %"],
  DE: ["Städtische Galerie %", "Kunsthalle %", "Landesmuseum %"],
  GB: ["% City Art Gallery", "% Museum"],
};

export const ACCESSION_FORMS = ["INV. #", "#", "SK-A-#", "19##.#", "NG#", "Inv. nr. #", "Gm #"] as const;

export const RIGHTS = [
  "https://creativecommons.org/publicdomain/mark/1.0/",
  "https://creativecommons.org/publicdomain/zero/1.0/",
  "http://rightsstatements.org/vocab/NoC-NC/1.0/",
  "http://rightsstatements.org/vocab/CNE/1.0/",
] as const;
