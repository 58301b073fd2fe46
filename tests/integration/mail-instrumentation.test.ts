import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { openDatabase, type DB } from "@/db/connection";
import { migrateToLatest } from "@/db/migrate";
import { enqueueMail, runningMailSender } from "@/lib/mail";
import { startSmtpCatcher, type SmtpCatcher } from "../support/smtp-catcher";

const shared = globalThis as unknown as { clearhallDb?: DB };
const SETTINGS = [
  "NEXT_RUNTIME",
  "NEXT_PHASE",
  "NODE_ENV",
  "AUTH_SECRET",
  "DATABASE_URL",
  "SMTP_URL",
  "MAIL_SENDER_DISABLED",
  "MAIL_SENDER_INTERVAL_MS",
] as const;
// Next.js types NODE_ENV as read-only; these tests set it like a deployment would.
const processEnv = process.env as Record<string, string | undefined>;
const saved = Object.fromEntries(SETTINGS.map((k) => [k, processEnv[k]]));

let dir: string;
let catcher: SmtpCatcher | undefined;

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), "clearhall-instrumentation-"));
  // A fresh module graph, so env() parses the settings each test sets.
  vi.resetModules();
});
afterEach(async () => {
  await runningMailSender()?.stop();
  await shared.clearhallDb?.destroy();
  delete shared.clearhallDb;
  await catcher?.stop();
  catcher = undefined;
  for (const key of SETTINGS) {
    if (saved[key] === undefined) delete processEnv[key];
    else processEnv[key] = saved[key];
  }
  vi.restoreAllMocks();
  rmSync(dir, { recursive: true, force: true });
});

async function register() {
  const { register } = await import("@/instrumentation");
  return register();
}

describe("register", () => {
  it("starts the mail sender on the Node.js runtime, sharing the app's database instance", async () => {
    catcher = await startSmtpCatcher();
    const databaseUrl = join(dir, "app.db");
    const setup = openDatabase(databaseUrl);
    await migrateToLatest(setup);
    await enqueueMail(
      setup,
      { kind: "question-received", to: "parent@example.net", subject: "Received", text: "Thank you." },
      new Date(),
      { host: "portal.example.org" },
    );
    await setup.destroy();
    Object.assign(process.env, {
      NEXT_RUNTIME: "nodejs",
      DATABASE_URL: databaseUrl,
      SMTP_URL: `smtp://127.0.0.1:${catcher.port}`,
      MAIL_SENDER_INTERVAL_MS: "200",
    });
    vi.spyOn(console, "info").mockImplementation(() => undefined);

    await register();

    expect(runningMailSender()).toBeDefined();
    expect(shared.clearhallDb).toBeDefined();
    const deadline = Date.now() + 5_000;
    while (catcher.messages.length === 0 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 25));
    expect(catcher.messages.map((m) => m.subject)).toEqual(["Received"]);
  });

  it("does nothing on the edge runtime", async () => {
    process.env.NEXT_RUNTIME = "edge";
    await register();
    expect(runningMailSender()).toBeUndefined();
    expect(shared.clearhallDb).toBeUndefined();
  });

  it.each([
    ["MAIL_SENDER_DISABLED", "1"],
    ["NEXT_PHASE", "phase-production-build"],
  ])("checks the settings but starts no sender when %s=%s", async (key, value) => {
    Object.assign(process.env, { NEXT_RUNTIME: "nodejs", DATABASE_URL: join(dir, "app.db"), [key]: value });
    await register();
    expect(runningMailSender()).toBeUndefined();
    expect(shared.clearhallDb).toBeUndefined();
  });

  it("stops start-up with the settings error, after logging its message", async () => {
    Object.assign(process.env, { NEXT_RUNTIME: "nodejs", NODE_ENV: "production" });
    delete process.env.AUTH_SECRET;
    delete process.env.NEXT_PHASE;
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);

    const exit = vi.spyOn(process, "exit").mockImplementation(() => undefined as never);

    await expect(register()).rejects.toThrow(/AUTH_SECRET is not set/);
    expect(exit).toHaveBeenCalledWith(1);
    exit.mockRestore();
    expect(logged).toHaveBeenCalledWith(expect.stringMatching(/AUTH_SECRET is not set/));
    expect(runningMailSender()).toBeUndefined();
  });
});
