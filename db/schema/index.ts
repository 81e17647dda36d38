export * from "./users";
export * from "./verification-tokens";
export * from "./account-tokens";
export * from "./audit-events";
export * from "./sign-in-limits";
export * from "./collections";
export * from "./places";
export * from "./sources";
