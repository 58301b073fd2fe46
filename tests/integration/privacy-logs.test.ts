import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createSmtpTransport, startMailSender, type MailSender } from "@/lib/mail";
import { createTestDb, type TestDb } from "../support/test-db";

// The route handler calls after() to run a delivery pass once the response has gone; outside a
// Next.js request there is no "after", so it runs at once here.
vi.mock("next/server", async (importOriginal) => {
  const actual = await importOriginal<typeof import("next/server")>();
  return { ...actual, after: (task: () => unknown) => void Promise.resolve().then(task) };
});

const ASKER = {
  name: "Oriel Vantongeren",
  email: "oriel.vantongeren@example.net",
  question: "My daughter Bettany has asthma; is the hydrogen peroxide disinfectant used in Room 12 safe for her?",
};

let t: TestDb;

beforeAll(async () => {
  t = await createTestDb();
  // The route handler reaches the database through db(), which opens DATABASE_URL once.
  process.env.DATABASE_URL = t.path;
  process.env.TRUST_PROXY = "1";
});
afterAll(async () => t.cleanup());

/** Everything written to the console or to stdout/stderr while `work` runs. */
async function captureOutput(work: () => Promise<void>): Promise<string> {
  const lines: string[] = [];
  const keep = (...args: unknown[]) => {
    lines.push(
      args
        .map((a) => (a instanceof Error ? `${a.name}: ${a.message}\n${a.stack ?? ""} ${JSON.stringify(a)}` : typeof a === "string" ? a : JSON.stringify(a)))
        .join(" "),
    );
  };
  const spies = [
    ...(["log", "info", "warn", "error", "debug"] as const).map((m) => vi.spyOn(console, m).mockImplementation(keep)),
    vi.spyOn(process.stdout, "write").mockImplementation((chunk: unknown) => (keep(String(chunk)), true)),
    vi.spyOn(process.stderr, "write").mockImplementation((chunk: unknown) => (keep(String(chunk)), true)),
  ];
  try {
    await work();
  } finally {
    for (const spy of spies) spy.mockRestore();
  }
  return lines.join("\n");
}

/** An SMTP server that can be told to refuse the recipient, quoting the address back as real servers do. */
async function startMailServer() {
  const state = { refuse: true, received: 0 };
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onRcptTo(address, _session, callback) {
      if (!state.refuse) return callback();
      const error = new Error(`5.1.1 <${address.address}>: Recipient address rejected: mailbox of ${address.address} is full`) as Error & { responseCode: number };
      error.responseCode = 550;
      callback(error);
    },
    onData(stream, _session, callback) {
      stream.resume();
      stream.on("end", () => {
        state.received += 1;
        callback();
      });
    },
  });
  const port = await new Promise<number>((resolve) => {
    const net = server.listen(0, "127.0.0.1", () => resolve((net.address() as { port: number }).port));
  });
  return { state, port, stop: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

async function waitFor(check: () => Promise<boolean> | boolean, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("condition not met in time");
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

async function outboxRow() {
  return t.db.selectFrom("outbox").selectAll().where("to_address", "=", ASKER.email).executeTakeFirstOrThrow();
}

/** Lets the next pass retry at once instead of after the backoff. */
async function dueNow() {
  await t.db.updateTable("outbox").set({ next_attempt_at: new Date(Date.now() - 1_000).toISOString() }).where("status", "=", "pending").execute();
}

describe("personal data stays out of logs and public answers", () => {
  it("asking, a refused delivery, a dead mail server, a database failure and the final delivery log nothing about the asker", { timeout: 60_000 }, async () => {
    const mail = await startMailServer();
    const deadPort = await (async () => {
      const probe = await startMailServer();
      await probe.stop();
      return probe.port;
    })();
    const { POST } = await import("@/app/api/questions/route");
    let sender: MailSender | undefined;
    let responseText = "";
    let statusUrl = "";

    const output = await captureOutput(async () => {
      // The sender as the app starts it (instrumentation.ts), logging to the console.
      const transport = { current: createSmtpTransport(`smtp://127.0.0.1:${mail.port}`, 2_000) };
      sender = startMailSender({
        db: t.db,
        transport: { sendMail: (m) => transport.current.sendMail(m) },
        from: "Wrenmoor Valley Schools <reopening@example.org>",
        intervalMs: 50,
        maxAttempts: 12,
      });

      const response = await POST(
        new Request("http://localhost:3000/api/questions", {
          method: "POST",
          headers: { "content-type": "application/json", "x-forwarded-for": "203.0.113.90" },
          body: JSON.stringify({ school: "district", topic: "cleaning", question: ASKER.question, name: ASKER.name, email: ASKER.email }),
        }),
      );
      expect(response.status).toBe(201);
      responseText = await response.text();
      statusUrl = (JSON.parse(responseText) as { statusUrl: string }).statusUrl;

      // 1. The server refuses the recipient, quoting the address.
      await waitFor(async () => (await outboxRow()).attempts >= 1);
      expect((await outboxRow()).last_error).toMatch(/550/);

      // 2. The server is down.
      transport.current = createSmtpTransport(`smtp://127.0.0.1:${deadPort}`, 2_000);
      await dueNow();
      await waitFor(async () => (await outboxRow()).attempts >= 2);

      // 3. The database fails under a pass.
      await t.db.schema.alterTable("outbox").renameTo("outbox_away").execute();
      await expect(sender.runNow()).rejects.toThrow(/outbox/);
      await t.db.schema.alterTable("outbox_away").renameTo("outbox").execute();

      // 4. Storing a question fails.
      await t.db.schema.alterTable("submission_attempts").renameTo("submission_attempts_away").execute();
      const failed = await POST(
        new Request("http://localhost:3000/api/questions", {
          method: "POST",
          headers: { "content-type": "application/json", "x-forwarded-for": "203.0.113.91" },
          body: JSON.stringify({ school: "district", topic: "cleaning", question: ASKER.question, name: ASKER.name, email: ASKER.email }),
        }),
      );
      expect(failed.status).toBe(500);
      expect(await failed.text()).not.toContain(ASKER.email);
      await t.db.schema.alterTable("submission_attempts_away").renameTo("submission_attempts").execute();

      // 5. The server is back and accepts the message.
      mail.state.refuse = false;
      transport.current = createSmtpTransport(`smtp://127.0.0.1:${mail.port}`, 2_000);
      await dueNow();
      await waitFor(async () => (await outboxRow()).status === "sent");
      await sender.stop();
    });
    await mail.stop();

    expect(mail.state.received).toBe(1);
    const attempts = await t.db.selectFrom("outbox_attempts").select(["ok", "error"]).orderBy("id").execute();
    expect(attempts.map((a) => a.ok)).toEqual([0, 0, 1]);
    // The failures were logged (so the test saw real log lines) ...
    expect(output).toMatch(/\[mail\] sent 0, retried 1, failed 0 \(outbox \d+: .*550/);
    expect(output).toMatch(/ECONNREFUSED/);
    expect(output).toMatch(/\[mail\] delivery pass failed: .*outbox/);
    expect(output).toMatch(/\[ask\] storing a question failed/);
    expect(output).toMatch(/\[mail\] sent 1, retried 0, failed 0/);
    // ... and neither they, the stored errors, nor the answer hold anything about the asker.
    const token = statusUrl.split("/").pop()!;
    for (const text of [output, JSON.stringify(attempts), (await outboxRow()).last_error ?? ""]) {
      expect(text).not.toContain(ASKER.email);
      expect(text).not.toContain("oriel.vantongeren");
      expect(text).not.toContain(ASKER.name);
      expect(text).not.toContain("Bettany");
      expect(text).not.toContain(token);
    }
    expect(JSON.parse(responseText)).toEqual({ reference: expect.stringMatching(/^Q-\d{4}-\d{4}$/), state: "received", statusUrl: expect.any(String) });
    expect(responseText).not.toContain(ASKER.email);
    expect(responseText).not.toContain(ASKER.name);
    expect(responseText).not.toContain("Bettany");
  });
});
