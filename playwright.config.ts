import { defineConfig } from "@playwright/test";

const appPort = Number(process.env.APP_PORT ?? 31000);
const smtpPort = Number(process.env.SMTP_PORT ?? 32000);
const uploadPort = Number(process.env.UPLOAD_STAND_IN_PORT ?? 33000);

// Debian's Chromium, never a downloaded browser. The flags keep it off the (closed) network.
const chromiumArgs = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export default defineConfig({
  testDir: "tests/browser",
  outputDir: ".data/test/playwright",
  timeout: 90_000,
  expect: { timeout: 15_000 },
  workers: 1,
  fullyParallel: false,
  use: {
    baseURL: `http://127.0.0.1:${appPort}`,
    browserName: "chromium",
    headless: true,
    launchOptions: { executablePath: "/usr/bin/chromium", args: chromiumArgs },
    trace: "retain-on-failure",
  },
  webServer: [
    { command: "npx tsx scripts/smtp-stand-in.ts", port: smtpPort, reuseExistingServer: false, timeout: 30_000 },
    { command: "npx tsx scripts/upload-stand-in.ts", port: uploadPort, reuseExistingServer: false, timeout: 30_000 },
    {
      command: `node scripts/serve.mjs -H 127.0.0.1 -p ${appPort}`,
      url: `http://127.0.0.1:${appPort}/sign-in`,
      reuseExistingServer: false,
      timeout: 120_000,
    },
  ],
});
