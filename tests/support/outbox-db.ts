import { afterAll, beforeAll, beforeEach } from "vitest";
import { createTestDb, type TestDb } from "./test-db";

/**
 * The set-up every mail test file shares: one migrated test database for the file, with an
 * empty outbox (and no delivery attempts) before each test. Read `.db` and `.path` inside
 * tests and hooks: the database opens in beforeAll.
 */
export function outboxTestDb(): Pick<TestDb, "db" | "path"> {
  let t: TestDb | undefined;
  beforeAll(async () => {
    t = await createTestDb();
  });
  afterAll(async () => t?.cleanup());
  beforeEach(async () => {
    await current().db.deleteFrom("outbox_attempts").execute();
    await current().db.deleteFrom("outbox").execute();
  });
  function current(): TestDb {
    if (!t) throw new Error("the test database opens in beforeAll");
    return t;
  }
  return {
    get db() {
      return current().db;
    },
    get path() {
      return current().path;
    },
  };
}
