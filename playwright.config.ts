import { defineConfig } from "@playwright/test";

const appPort = Number(process.env.E2E_APP_PORT ?? 3200);
const smtpPort = Number(process.env.E2E_SMTP_PORT ?? 3225);
const mailWebPort = Number(process.env.E2E_MAIL_WEB_PORT ?? 3280);

// `npm test` builds the app and sets these; running `npx playwright test` alone expects a build already made.
export default defineConfig({
  testDir: "tests/e2e",
  outputDir: process.env.E2E_DIR ? `${process.env.E2E_DIR}/results` : "test-results",
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  reporter: [["list"]],
  timeout: 30_000,
  use: {
    baseURL: `http://localhost:${appPort}`,
    trace: "off",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
  webServer: [
    {
      command: `node node_modules/maildev/dist/bin/maildev.js --smtp ${smtpPort} --web ${mailWebPort} --ip 127.0.0.1 --web-ip 127.0.0.1 --silent`,
      url: `http://127.0.0.1:${mailWebPort}/api/healthz`,
      reuseExistingServer: false,
      timeout: 20_000,
    },
    {
      command: `npx next start -p ${appPort}`,
      url: `http://localhost:${appPort}/`,
      reuseExistingServer: false,
      timeout: 60_000,
    },
  ],
});
