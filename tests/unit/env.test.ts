import { describe, expect, it } from "vitest";
import { EnvError, parseEnv } from "@/lib/env";

describe("settings", () => {
  it("has demo defaults for a fresh clone", () => {
    const env = parseEnv({ NODE_ENV: "development" });
    expect(env).toMatchObject({
      DATABASE_URL: "./data/clearhall.db",
      SMTP_URL: "smtp://127.0.0.1:1025",
      APP_URL: "http://localhost:3000",
      ASK_RATE_LIMIT_COUNT: 5,
      ASK_RATE_LIMIT_WINDOW_MINUTES: 10,
      TRUST_PROXY: 0,
    });
    expect(env.AUTH_SECRET.length).toBeGreaterThanOrEqual(32);
  });

  it("stops a production start without AUTH_SECRET, naming the setting", () => {
    expect(() => parseEnv({ NODE_ENV: "production" })).toThrow(EnvError);
    expect(() => parseEnv({ NODE_ENV: "production" })).toThrow(/AUTH_SECRET is not set/);
  });

  it("lets the production build run without the secret, since the build serves nobody", () => {
    expect(() => parseEnv({ NODE_ENV: "production", NEXT_PHASE: "phase-production-build" })).not.toThrow();
  });

  it("rejects a bad value with a message naming it", () => {
    expect(() => parseEnv({ SMTP_URL: "http://mail" })).toThrow(/SMTP_URL/);
    expect(() => parseEnv({ NODE_ENV: "production", AUTH_SECRET: "short" })).toThrow(/at least 32/);
    expect(() => parseEnv({ ASK_RATE_LIMIT_COUNT: "0" })).toThrow(/ASK_RATE_LIMIT_COUNT/);
    expect(() => parseEnv({ ASK_RATE_LIMIT_WINDOW_MINUTES: "ten" })).toThrow(/ASK_RATE_LIMIT_WINDOW_MINUTES/);
    expect(() => parseEnv({ TRUST_PROXY: "yes" })).toThrow(/TRUST_PROXY/);
  });

  it("reads the question rate limit and the proxy setting", () => {
    expect(parseEnv({ ASK_RATE_LIMIT_COUNT: "3", ASK_RATE_LIMIT_WINDOW_MINUTES: "30", TRUST_PROXY: "1" })).toMatchObject({
      ASK_RATE_LIMIT_COUNT: 3,
      ASK_RATE_LIMIT_WINDOW_MINUTES: 30,
      TRUST_PROXY: 1,
    });
  });
});
