// `npm test`: every check a change must pass, in order of speed, stopping at the first failure.
import { mkdirSync, rmSync } from "node:fs";
import { resolve } from "node:path";
import { ensureChromium } from "./ensure-chromium.mjs";
import { freePort, run } from "./lib/run.mjs";

const env = { NEXT_TELEMETRY_DISABLED: "1" };

// `npm test` runs every part; `npm test -- e2e` (or static, unit) runs one, and any further
// arguments go to Playwright, e.g. `npm test -- e2e tests/e2e/staff-sign-in.spec.ts`.
const [part = "all", ...rest] = process.argv.slice(2);
const wants = (name) => part === "all" || part === name;

if (wants("static")) {
  run("npx", ["tsc", "--noEmit"], { env });
  run("npx", ["eslint", ".", "--max-warnings=0"], { env });
}
if (wants("unit")) run("npx", ["vitest", "run"], { env });
if (!wants("e2e")) process.exit(0);

ensureChromium();

// Browser tests run against a production build over a fresh database with the demo data.
const dir = resolve(process.env.E2E_DIR ?? ".tmp/e2e");
rmSync(dir, { recursive: true, force: true });
mkdirSync(dir, { recursive: true });
const [appPort, smtpPort, mailWebPort] = [await freePort(), await freePort(), await freePort()];
const e2eEnv = {
  ...env,
  DATABASE_URL: resolve(dir, "clearhall.db"),
  APP_URL: `http://localhost:${appPort}`,
  NEXTAUTH_URL: `http://localhost:${appPort}`,
  SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
  E2E_APP_PORT: String(appPort),
  E2E_SMTP_PORT: String(smtpPort),
  E2E_MAIL_WEB_PORT: String(mailWebPort),
  AUTH_SECRET: "e2e-secret-e2e-secret-e2e-secret-e2e-secret",
  MAIL_SENDER_INTERVAL_MS: "500",
  // Browser tests give each scenario its own X-Forwarded-For address, so one test's questions never use up another's rate limit.
  TRUST_PROXY: "1",
};
run("npm", ["run", "db:seed"], { env: e2eEnv });
run("npm", ["run", "build"], { env: e2eEnv });
run("npx", ["playwright", "test", ...rest], { env: e2eEnv });
console.log("\nAll checks passed.");
