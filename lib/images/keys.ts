// Where an image's objects live. The storage key is a random UUID, so object names cannot be guessed
// from image ids; the app serves every object itself, after checking who is asking.
export const imagePrefix = (storageKey: string) => `images/${storageKey}/`;
export const originalKey = (storageKey: string) => `images/${storageKey}/original`;
export const tilesPrefix = (storageKey: string) => `images/${storageKey}/iiif/`;
export const thumbnailKey = (storageKey: string) => `images/${storageKey}/thumb.jpg`;
export const previewKey = (storageKey: string) => `images/${storageKey}/preview.jpg`;
/** Derived requests computed once and kept, by their canonical IIIF path. */
export const cacheKey = (storageKey: string, canonical: string) => `images/${storageKey}/cache/${canonical}`;
