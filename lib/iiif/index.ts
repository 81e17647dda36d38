// IIIF Image API 3.0 arithmetic for Cordarium: requests, info.json, tiles and region links.
// Pure TypeScript (no sharp, no I/O, no server-only) so that browser and server share it.
export * from "./capabilities";
export * from "./limits";
export * from "./request";
export * from "./info";
export * from "./tiles";
export * from "./fragments";
