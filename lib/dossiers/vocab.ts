// The dossiers' controlled lists, shared by the database schema, the API and the forms (pure).
export const DOSSIER_VISIBILITIES = ["private", "shared", "public"] as const;
export type DossierVisibility = (typeof DOSSIER_VISIBILITIES)[number];

export const DOSSIER_ITEM_KINDS = ["region", "source"] as const;
export type DossierItemKind = (typeof DOSSIER_ITEM_KINDS)[number];
