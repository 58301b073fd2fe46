import { spawn, spawnSync } from "node:child_process";
import { createServer } from "node:net";

/** Runs a command to completion with inherited output; exits the script on failure. */
export function run(command, args, options = {}) {
  const label = [command, ...args].join(" ");
  console.log(`\n▶ ${label}`);
  const result = spawnSync(command, args, { stdio: "inherit", ...options, env: { ...process.env, ...options.env } });
  if (result.status !== 0) {
    console.error(`✗ ${label} failed (exit ${result.status ?? result.signal}).`);
    process.exit(result.status ?? 1);
  }
}

/** Starts a long-running child that ends with this process. */
export function start(command, args, options = {}) {
  const child = spawn(command, args, { stdio: "inherit", ...options, env: { ...process.env, ...options.env } });
  return child;
}

/** A TCP port nobody is listening on right now, on loopback. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}
