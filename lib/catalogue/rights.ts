// The rights a source or image may carry, stored by URI: the twelve RightsStatements.org statements
// (rightsstatements.org/page/1.0) and the Creative Commons licences and tools (creativecommons.org).
import { z } from "zod";

export type RightsOption = { uri: string; label: string; group: "In copyright" | "No copyright" | "Other" | "Creative Commons" };

const rs = (id: string) => `http://rightsstatements.org/vocab/${id}/1.0/`;

export const RIGHTS: RightsOption[] = [
  { uri: rs("InC"), label: "In Copyright", group: "In copyright" },
  { uri: rs("InC-OW-EU"), label: "In Copyright – EU Orphan Work", group: "In copyright" },
  { uri: rs("InC-EDU"), label: "In Copyright – Educational Use Permitted", group: "In copyright" },
  { uri: rs("InC-NC"), label: "In Copyright – Non-Commercial Use Permitted", group: "In copyright" },
  { uri: rs("InC-RUU"), label: "In Copyright – Rights-holder(s) Unlocatable or Unidentifiable", group: "In copyright" },
  { uri: rs("NoC-CR"), label: "No Copyright – Contractual Restrictions", group: "No copyright" },
  { uri: rs("NoC-NC"), label: "No Copyright – Non-Commercial Use Only", group: "No copyright" },
  { uri: rs("NoC-OKLR"), label: "No Copyright – Other Known Legal Restrictions", group: "No copyright" },
  { uri: rs("NoC-US"), label: "No Copyright – United States", group: "No copyright" },
  { uri: rs("CNE"), label: "Copyright Not Evaluated", group: "Other" },
  { uri: rs("UND"), label: "Copyright Undetermined", group: "Other" },
  { uri: rs("NKC"), label: "No Known Copyright", group: "Other" },
  { uri: "https://creativecommons.org/publicdomain/zero/1.0/", label: "CC0 1.0 Universal (public domain dedication)", group: "Creative Commons" },
  { uri: "https://creativecommons.org/publicdomain/mark/1.0/", label: "Public Domain Mark 1.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by/4.0/", label: "CC BY 4.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by-sa/4.0/", label: "CC BY-SA 4.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by-nc/4.0/", label: "CC BY-NC 4.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by-nc-sa/4.0/", label: "CC BY-NC-SA 4.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by-nd/4.0/", label: "CC BY-ND 4.0", group: "Creative Commons" },
  { uri: "https://creativecommons.org/licenses/by-nc-nd/4.0/", label: "CC BY-NC-ND 4.0", group: "Creative Commons" },
];

const byUri = new Map(RIGHTS.map((r) => [r.uri, r]));

export function rightsLabel(uri: string | null | undefined): string | null {
  return uri ? (byUri.get(uri)?.label ?? null) : null;
}

export const rightsUriSchema = z.string().refine((u) => byUri.has(u), {
  message: "Choose a RightsStatements.org statement or a Creative Commons licence from the list.",
});
