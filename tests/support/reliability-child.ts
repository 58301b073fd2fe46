// A separate process for the reliability tests: its own better-sqlite3 connection to a shared
// database file, so concurrency, crashes and restarts are real and not simulated in one process.
// Run with `node --import tsx tests/support/reliability-child.ts <mode> <database> [...]`; it
// prints one JSON line with what it did. Modes:
//   submit <database> <worker> <count> <startAtMs>  submit `count` questions at once, from `startAtMs`
//   submit-then-die <database> <email>             submit one question, then die before any mail is sent
//   claim-then-die <database>                      take the first due message and die while sending it
import { openDatabase } from "@/db/connection";
import { deliverDueMail } from "@/lib/mail/sender";
import { submitQuestion, type SubmitOptions } from "@/lib/questions/submit";

const [mode, database, ...args] = process.argv.slice(2);

const CHILD_APP_URL = "https://reopening.example.org";

function options(ip: string): SubmitOptions {
  return {
    ip,
    secret: "reliability-secret-reliability-secret",
    appUrl: CHILD_APP_URL,
    rateLimit: { count: 1_000, windowMinutes: 10 },
    via: "api",
  };
}

function question(email: string, n: number) {
  return {
    school: "district",
    topic: "cleaning",
    question: `How often are the door handles wiped in the first week back? (${n})`,
    email,
    name: `Parent ${n}`,
  };
}

function print(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value)}\n`);
}

async function main(): Promise<void> {
  if (!database) throw new Error("no database path given");
  const db = openDatabase(database);

  if (mode === "submit") {
    const worker = Number(args[0]);
    const count = Number(args[1]);
    const startAt = Number(args[2]);
    // Every process starts at the same moment, so their transactions really overlap.
    await new Promise((resolve) => setTimeout(resolve, Math.max(0, startAt - Date.now())));
    const outcomes = await Promise.all(
      Array.from({ length: count }, async (_, i) => {
        const n = worker * 1_000 + i;
        try {
          const result = await submitQuestion(db, question(`load.${worker}.${i}@example.net`, n), options(`198.51.100.${worker}`));
          return result.ok ? { reference: result.reference } : { error: result.reason };
        } catch (error) {
          return { error: error instanceof Error ? error.message : String(error) };
        }
      }),
    );
    print({
      references: outcomes.flatMap((o) => ("reference" in o ? [o.reference] : [])),
      errors: outcomes.flatMap((o) => ("error" in o ? [o.error] : [])),
    });
    await db.destroy();
    return;
  }

  if (mode === "submit-then-die") {
    const result = await submitQuestion(db, question(args[0] ?? "crash@example.net", 1), options("198.51.100.200"));
    print(result.ok ? { reference: result.reference } : { error: result.reason });
    // The process ends the way a power cut or an OOM kill would: no clean-up, no sender pass.
    process.kill(process.pid, "SIGKILL");
    return;
  }

  if (mode === "claim-then-die") {
    await deliverDueMail(
      db,
      {
        async sendMail(mail) {
          print({ claimed: mail.messageId });
          process.kill(process.pid, "SIGKILL");
          return new Promise(() => undefined);
        },
      },
      { from: "Wrenmoor Valley Schools <reopening@example.org>", maxAttempts: 5, batchSize: 1 },
    );
    print({ claimed: null });
    await db.destroy();
    return;
  }

  throw new Error(`unknown mode ${String(mode)}`);
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
