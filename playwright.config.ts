import { defineConfig } from "@playwright/test";

// Runs against the app the test command started (TEST_APP_URL), in Debian's Chromium.
export default defineConfig({
  testDir: "tests/e2e",
  workers: 1,
  fullyParallel: false,
  retries: 0,
  timeout: 30_000,
  expect: { timeout: 7_000 },
  reporter: "list",
  outputDir: process.env.PLAYWRIGHT_OUTPUT_DIR ?? ".data/test/playwright-results",
  use: {
    baseURL: process.env.TEST_APP_URL ?? "http://localhost:3100",
    browserName: "chromium",
    trace: "retain-on-failure",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    },
  },
});
