// `npm run demo`: the whole demo on one machine — database with demo data, production build,
// the app on http://localhost:3000 (with its mail sender) and a local mail catcher.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { run, start } from "./lib/run.mjs";

const port = process.env.PORT ?? "3000";
const appUrl = process.env.APP_URL ?? `http://localhost:${port}`;

// A secret made once per checkout and kept in data/, so demo sessions survive a restart.
mkdirSync("data", { recursive: true });
const secretFile = "data/demo-auth-secret";
if (!process.env.AUTH_SECRET && !existsSync(secretFile)) writeFileSync(secretFile, randomBytes(32).toString("base64url"), { mode: 0o600 });
const env = {
  NEXT_TELEMETRY_DISABLED: "1",
  APP_URL: appUrl,
  NEXTAUTH_URL: appUrl,
  AUTH_SECRET: process.env.AUTH_SECRET ?? readFileSync(secretFile, "utf8").trim(),
  SMTP_URL: process.env.SMTP_URL ?? "smtp://127.0.0.1:1025",
};

run("npm", ["run", "db:seed"], { env });
run("npm", ["run", "build"], { env });

const children = [
  start(process.execPath, ["node_modules/maildev/dist/bin/maildev.js", "--smtp", "1025", "--web", "1080", "--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "--silent"]),
  start(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", port], { env }),
];

console.log(`
Clearhall demo
  Public site:   ${appUrl}
  Staff sign-in: ${appUrl}/signin
  Mail inbox:    http://127.0.0.1:1080  (every e-mail the app sends lands here)

  Demo staff accounts (password for all: clearhall-demo)
    comms@example.org        communications
    facilities@example.org   facilities
    admin@example.org        admin

Press Ctrl+C to stop.
`);

let stopping = false;
function stopAll(code = 0) {
  if (stopping) return;
  stopping = true;
  for (const child of children) if (child.exitCode === null) child.kill("SIGTERM");
  process.exitCode = code;
}
process.on("SIGINT", () => stopAll(0));
process.on("SIGTERM", () => stopAll(0));
for (const child of children) {
  child.on("exit", (code) => {
    if (!stopping) console.error(`A demo process stopped (exit ${code}); stopping the rest.`);
    stopAll(code ?? 0);
  });
}
