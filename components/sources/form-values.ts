// Between a stored source and the form's string-valued fields.
import type { SourceFieldsInput } from "@/lib/sources/schemas";

export type BibliographyValues = { author: string; title: string; year: string; pages: string; link: string };

export type SourceFormValues = {
  title: string;
  objectType: string;
  artist: string;
  attributionQualifier: string;
  medium: string;
  height: string;
  width: string;
  dimensionUnit: string;
  collectionId: string;
  accessionNumber: string;
  datingEdtf: string;
  placeId: number | null;
  rightsUri: string;
  creditLine: string;
  description: string;
  reliabilityNote: string;
  bibliography: BibliographyValues[];
  state: string;
};

export type StoredSource = {
  [K in keyof Omit<SourceFormValues, "bibliography" | "placeId">]?: string | number | null;
} & { placeId?: number | null; bibliography?: { author: string; title: string; year: string | null; pages: string | null; link: string | null }[] };

const s = (v: unknown) => (v === null || v === undefined ? "" : String(v));

export function toFormValues(source?: StoredSource): SourceFormValues {
  return {
    title: s(source?.title),
    objectType: s(source?.objectType ?? "painting"),
    artist: s(source?.artist),
    attributionQualifier: s(source?.attributionQualifier ?? "by"),
    medium: s(source?.medium),
    height: s(source?.height),
    width: s(source?.width),
    dimensionUnit: s(source?.dimensionUnit ?? "cm"),
    collectionId: s(source?.collectionId),
    accessionNumber: s(source?.accessionNumber),
    datingEdtf: s(source?.datingEdtf),
    placeId: source?.placeId ?? null,
    rightsUri: s(source?.rightsUri),
    creditLine: s(source?.creditLine),
    description: s(source?.description),
    reliabilityNote: s(source?.reliabilityNote),
    bibliography: (source?.bibliography ?? []).map((b) => ({ author: b.author, title: b.title, year: s(b.year), pages: s(b.pages), link: s(b.link) })),
    state: s(source?.state ?? "draft"),
  };
}

export const toInput = (values: SourceFormValues): SourceFieldsInput => values as unknown as SourceFieldsInput;
