export const ROLE_LABELS = {
  reader: "Reader",
  contributor: "Contributor",
  editor: "Editor",
  admin: "Admin",
} as const;
