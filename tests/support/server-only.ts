// Under vitest there is no React server bundle; the "server-only" marker is a no-op here.
export {};
