// The template users download: the header row and two example rows. Every title, artist and
// collection here is invented (the collections are the demo scenario's); the places are real cities.
import Papa from "papaparse";
import { IMPORT_COLUMNS, type ImportColumn } from "./import-types";

const EXAMPLES: Record<ImportColumn, string>[] = [
  {
    title: "A Woman Tuning a Cittern by a Window",
    object_type: "Painting",
    attribution: "attributed to",
    artist: "Aldo Vessanti",
    medium: "oil on canvas",
    height: "64.5",
    width: "52",
    unit: "cm",
    collection: "Galleria Vellastri",
    accession_number: "GV-TEMPLATE-1",
    dating: "1650~",
    place: "Verona",
    country: "IT",
    rights: "No Known Copyright",
    credit_line: "Galleria Vellastri, invented bequest of 1921",
    description: "A seated woman turns a peg of a small cittern; a sheet of music lies open on the table.",
    reliability_note: "The strings were repainted in the nineteenth century.",
    state: "draft",
    bibliography: "Orsetti, Marta | Citterns in Veronese Interiors | 1998 | 41-43 | ; Pellweg, Jan | Plucked Strings in Painting | 2004 | | https://example.org/pellweg",
  },
  {
    title: "Title Page with a Lute Player",
    object_type: "Print",
    attribution: "workshop of",
    artist: "Hendrick Oudeboom",
    medium: "engraving",
    height: "18",
    width: "12.5",
    unit: "cm",
    collection: "Stichting Oudewaal Prentenkabinet",
    accession_number: "SOP-TEMPLATE-2",
    dating: "1620/1630",
    place: "Haarlem",
    country: "NL",
    rights: "https://creativecommons.org/publicdomain/mark/1.0/",
    credit_line: "",
    description: "A young man plays a lute under an arch of laurel, above an invented publisher's address.",
    reliability_note: "",
    state: "draft",
    bibliography: "",
  },
];

export const TEMPLATE_FILE_NAME = "cordarium-sources-template.csv";

/** RFC 4180 line ends (CRLF), every field quoted only where needed. */
export function importTemplateCsv(): string {
  return Papa.unparse({ fields: [...IMPORT_COLUMNS], data: EXAMPLES.map((row) => IMPORT_COLUMNS.map((c) => row[c])) }, { newline: "\r\n" }) + "\r\n";
}
