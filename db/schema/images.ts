import { char, index, int, mysqlEnum, mysqlTable, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, ref, timestamps, version } from "./columns";

export const IMAGE_STATES = ["uploading", "waiting", "processing", "ready", "failed"] as const;
export const IMAGE_KINDS = ["whole", "detail"] as const;

// One photograph or scan of a source. The original and every derivative live in object storage under
// `storageKey`, a random prefix that cannot be guessed from the id.
export const images = mysqlTable(
  "images",
  {
    id: id(),
    sourceId: ref("source_id").notNull(),
    storageKey: char("storage_key", { length: 36 }).notNull(),
    kind: mysqlEnum("kind", IMAGE_KINDS).notNull().default("whole"),
    caption: varchar("caption", { length: 300 }),
    photoCredit: varchar("photo_credit", { length: 300 }),
    rightsUri: varchar("rights_uri", { length: 200 }),
    originalFilename: varchar("original_filename", { length: 255 }).notNull(),
    declaredType: varchar("declared_type", { length: 100 }),
    mimeType: varchar("mime_type", { length: 100 }),
    byteSize: int("byte_size", { unsigned: true }),
    width: int("width", { unsigned: true }),
    height: int("height", { unsigned: true }),
    sha256: char("sha256", { length: 64 }),
    phash: char("phash", { length: 16 }),
    // Set when the perceptual hash is close to another image's: a warning, not a refusal.
    nearDuplicateOf: ref("near_duplicate_of"),
    nearDuplicateDistance: int("near_duplicate_distance"),
    state: mysqlEnum("state", IMAGE_STATES).notNull().default("uploading"),
    failureReason: text("failure_reason"),
    multipartUploadId: varchar("multipart_upload_id", { length: 300 }),
    position: int("position").notNull().default(0),
    uploadedBy: ref("uploaded_by").notNull(),
    readyAt: timestamp("ready_at", { fsp: 3 }),
    deletedAt: timestamp("deleted_at", { fsp: 3 }),
    version: version(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex("images_storage_key").on(t.storageKey),
    index("images_source").on(t.sourceId, t.position, t.id),
    index("images_sha256").on(t.sha256),
    index("images_state").on(t.state, t.updatedAt),
  ],
);

export type Image = typeof images.$inferSelect;
