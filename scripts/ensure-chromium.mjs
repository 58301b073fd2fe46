import { existsSync } from "node:fs";
import { spawnSync } from "node:child_process";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const INSTALL = "apt-get update && apt-get install -y chromium";

/**
 * Browser tests use Debian's chromium, never a downloaded browser. Installs it
 * when this process may (root with apt), or stops with the exact command.
 */
export function ensureChromium() {
  if (existsSync(CHROMIUM_PATH)) return;
  const isRoot = typeof process.getuid === "function" && process.getuid() === 0;
  const hasApt = spawnSync("sh", ["-c", "command -v apt-get"], { stdio: "ignore" }).status === 0;
  if (isRoot && hasApt) {
    console.log(`Chromium is missing at ${CHROMIUM_PATH}; installing Debian's package…`);
    const result = spawnSync("sh", ["-c", `${INSTALL} -qq`], { stdio: "inherit", env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
    if (result.status === 0 && existsSync(CHROMIUM_PATH)) return;
  }
  console.error(
    `Browser tests need Chromium at ${CHROMIUM_PATH}. Install it with:\n\n  sudo sh -c "${INSTALL}"\n\n` +
      "or set CHROMIUM_PATH to an installed Chromium.",
  );
  process.exit(1);
}

if (import.meta.url === `file://${process.argv[1]}`) ensureChromium();
