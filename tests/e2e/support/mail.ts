import { expect } from "@playwright/test";

const MAIL_API = `http://127.0.0.1:${process.env.E2E_MAIL_WEB_PORT ?? 3280}/api/email`;

export interface CaughtMail {
  subject: string;
  text: string;
  html: string;
  to: { address: string }[];
}

export async function allMail(): Promise<CaughtMail[]> {
  const response = await fetch(MAIL_API);
  if (!response.ok) throw new Error(`maildev answered ${response.status}`);
  return (await response.json()) as CaughtMail[];
}

export async function mailTo(address: string): Promise<CaughtMail[]> {
  return (await allMail()).filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Waits for the app's sender (every 500 ms in tests) to deliver a message to `address`. */
export async function waitForMailTo(address: string, timeoutMs = 15_000): Promise<CaughtMail> {
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        found = (await mailTo(address))[0];
        return Boolean(found);
      },
      { timeout: timeoutMs, message: `no e-mail reached ${address}` },
    )
    .toBe(true);
  return found!;
}
