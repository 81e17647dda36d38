// The invented demo scenario. Every person, collection and place name here is made up.
import type { Role } from "../schema/users";

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: "admin@cordarium.test", name: "Ottavia Brennmoor", role: "admin" },
  { email: "editor@cordarium.test", name: "Ilario Vessendt", role: "editor" },
  { email: "contributor@cordarium.test", name: "Maren Quillfeather", role: "contributor" },
  { email: "reader@cordarium.test", name: "Tobiah Lanzwick", role: "reader" },
];

export const DEMO_COLLECTIONS = [
  {
    name: "Galleria Vellastri",
    city: "Verona",
    countryCode: "IT",
    url: "https://vellastri.example",
    notes: "Invented civic picture gallery; strong in genre scenes with music.",
  },
  {
    name: "Stichting Oudewaal Prentenkabinet",
    city: "Haarlem",
    countryCode: "NL",
    url: "https://oudewaal.example",
    notes: "Invented print room; title-page engravings and tavern scenes.",
  },
  {
    name: "Colección Marqués de Albercón",
    city: "Sevilla",
    countryCode: "ES",
    url: null,
    notes: "Invented private collection; access by appointment only.",
  },
  {
    name: "Musée Herbelin-Saint-Clair",
    city: "Lyon",
    countryCode: "FR",
    url: "https://herbelin.example",
    notes: "Invented museum of decorative arts; tiles and textiles with players.",
  },
];
