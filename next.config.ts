import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Native or data-file packages must stay outside the server bundle (see DEVELOPERS.md).
  serverExternalPackages: ["sharp", "mysql2", "@node-rs/argon2", "rate-limiter-flexible", "nodemailer"],
  // The demo and the test suite build into separate folders so that one never breaks the other.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // The test command type-checks the whole project with tsc; the build need not do it twice.
  typescript: { ignoreBuildErrors: true },
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
