// Invented demo sources: made-up works by made-up painters in the invented demo collections, placed
// in real cities of the gazetteer. Idempotent: a source whose title exists is left alone.
import { and, desc, eq } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { readDating } from "../../lib/dating";
import { foldName } from "../../lib/places/fold";
import type { ObjectType } from "../../lib/sources/vocab";
import * as schema from "../schema";

type Demo = {
  title: string;
  objectType: ObjectType;
  artist: string | null;
  attributionQualifier: (typeof schema.sources.$inferInsert)["attributionQualifier"];
  medium: string;
  dating: string;
  place: [string, string];
  collection: string;
  accession: string;
  description: string;
  reliability: string;
  state: "draft" | "published";
};

const CC0 = "https://creativecommons.org/publicdomain/zero/1.0/";

export const DEMO_SOURCES: Demo[] = [
  { title: "A Guitarist Strumming at a Tavern Table", objectType: "painting", artist: "Bartolo Ferrucci", attributionQualifier: "by", medium: "oil on canvas", dating: "1652", place: ["Naples", "IT"], collection: "Galleria Vellastri", accession: "GV 0412", description: "A young man strums a five-course guitar with a recessed rose; two drinkers listen.", reliability: "Observed from life, by the handling of the hands; the guitar's frets are summary.", state: "published" },
  { title: "The Serenade under the Balcony", objectType: "painting", artist: "Bartolo Ferrucci", attributionQualifier: "workshop_of", medium: "oil on canvas", dating: "1655~", place: ["Naples", "IT"], collection: "Galleria Vellastri", accession: "GV 0413", description: "A guitarist in a cloak plays to a woman at a window; the right hand is over the rose.", reliability: "Workshop replica of a lost composition; details may be copied rather than observed.", state: "published" },
  { title: "Lute Player with a Songbook", objectType: "drawing", artist: "Hendrick Oudewater", attributionQualifier: "attributed_to", medium: "red chalk on paper", dating: "1630/1640", place: ["Haarlem", "NL"], collection: "Stichting Oudewaal Prentenkabinet", accession: "OW-T-221", description: "A seated lutenist reads from an open book on a table; the little finger rests on the soundboard.", reliability: "A study after the model; the instrument is drawn with care.", state: "published" },
  { title: "Title page with a Cittern and a Viol", objectType: "book_illustration", artist: null, attributionQualifier: "anonymous", medium: "engraving", dating: "[1667,1670..1672]", place: ["Amsterdam", "NL"], collection: "Stichting Oudewaal Prentenkabinet", accession: "OW-B-087", description: "An emblematic title page with a cittern and a bass viol hung on a garland.", reliability: "Schematic; the instruments are emblems, not portraits of instruments.", state: "published" },
  { title: "Dancers and a Guitar at a Village Feast", objectType: "print", artist: "Jan Kortewind", attributionQualifier: "after", medium: "etching", dating: "165X", place: ["Antwerpen", "BE"], collection: "Stichting Oudewaal Prentenkabinet", accession: "OW-P-1310", description: "A guitarist plays for dancing; the instrument is held high across the chest with a strap.", reliability: "A print after a painting; the printmaker reversed the image, so the player appears left-handed.", state: "published" },
  { title: "Young Woman Tuning a Guitar", objectType: "painting", artist: "Inés de Valdoria", attributionQualifier: "by", medium: "oil on panel", dating: "1648?", place: ["Sevilla", "ES"], collection: "Colección Marqués de Albercón", accession: "MA 33", description: "She turns a peg with her left hand; ten pegs, nine strings visible.", reliability: "Date uncertain: read from a damaged inscription.", state: "published" },
  { title: "Street Musicians at the Fountain", objectType: "painting", artist: "Inés de Valdoria", attributionQualifier: "circle_of", medium: "oil on canvas", dating: "1660/1675", place: ["Sevilla", "ES"], collection: "Colección Marqués de Albercón", accession: "MA 41", description: "A blind guitarist and a boy with a tambourine; the guitarist strums near the bridge.", reliability: "Overpainted in the sky; the figures are in good condition.", state: "published" },
  { title: "Tile with a Guitar Player", objectType: "tile", artist: null, attributionQualifier: "anonymous", medium: "tin-glazed earthenware", dating: "../1700", place: ["Lyon", "FR"], collection: "Musée Herbelin-Saint-Clair", accession: "HSC 1902.14", description: "A single blue-painted tile with a standing player and a small dog.", reliability: "Schematic decoration; counts of strings and frets are not meaningful.", state: "published" },
  { title: "Theorbo Player in a Music Room", objectType: "painting", artist: "Matthieu Granvaux", attributionQualifier: "follower_of", medium: "oil on canvas", dating: "1670~/1685", place: ["Paris", "FR"], collection: "Musée Herbelin-Saint-Clair", accession: "HSC 1955.3", description: "A theorbo with a long extended neck, played seated with the instrument resting on the knee.", reliability: "A pastiche of a better-known composition; the theorbo's neck is foreshortened oddly.", state: "draft" },
  { title: "Tapestry Fragment with a Vihuela", objectType: "textile", artist: null, attributionQualifier: "anonymous", medium: "wool and silk", dating: "15XX", place: ["Toledo", "ES"], collection: "Musée Herbelin-Saint-Clair", accession: "HSC 1961.7", description: "A courtly player with a waisted vihuela, six courses suggested by the weave.", reliability: "Woven detail limits the evidence to outline and posture.", state: "published" },
];

export async function seedSources(db: MySql2Database<typeof schema>, authorId: number) {
  for (const demo of DEMO_SOURCES) {
    const [exists] = await db.select({ id: schema.sources.id }).from(schema.sources).where(eq(schema.sources.title, demo.title));
    if (exists) continue;
    const [collection] = await db.select({ id: schema.collections.id }).from(schema.collections).where(eq(schema.collections.name, demo.collection));
    const [place] = await db
      .select({ id: schema.places.id, countryCode: schema.places.countryCode })
      .from(schema.places)
      .where(and(eq(schema.places.foldedName, foldName(demo.place[0])), eq(schema.places.countryCode, demo.place[1])))
      .orderBy(desc(schema.places.population))
      .limit(1);
    const dating = readDating(demo.dating);
    if (!dating.ok) throw new Error(`demo dating ${demo.dating}: ${dating.error}`);
    await db.transaction(async (tx) => {
      const values = {
        title: demo.title,
        objectType: demo.objectType,
        artist: demo.artist,
        attributionQualifier: demo.attributionQualifier,
        medium: demo.medium,
        collectionId: collection?.id ?? null,
        accessionNumber: demo.accession,
        datingEdtf: dating.edtf,
        datingEarliest: dating.earliest,
        datingLatest: dating.latest,
        datingSearchEarliest: dating.widenedEarliest,
        datingSearchLatest: dating.widenedLatest,
        datingApproximate: dating.approximate,
        datingUncertain: dating.uncertain,
        placeId: place?.id ?? null,
        countryCode: place?.countryCode ?? null,
        rightsUri: CC0,
        creditLine: `${demo.collection} (invented demo collection)`,
        description: demo.description,
        reliabilityNote: demo.reliability,
        state: demo.state,
        createdBy: authorId,
      };
      const [{ id }] = await tx.insert(schema.sources).values(values).$returningId();
      await tx.insert(schema.auditEvents).values({ actorId: authorId, action: "source.created", entityType: "source", entityId: String(id), after: { id, ...values } });
    });
    console.log(`  source ${demo.title}`);
  }
}
