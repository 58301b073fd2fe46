// Runs in the browser before the app's own code. zod 4 compiles object schemas with
// `new Function` when it may; under our Content-Security-Policy (no 'unsafe-eval') its probe
// for that is refused and reported as a violation, though zod then parses without it. Turning
// the compiler off here keeps the policy strict and the reports meaningful.
//
// zod keeps its settings in globalThis.__zod_globalConfig and adopts an object already there
// (zod/v4/core/core.js), so the setting costs no download here: importing zod in this file put
// all of it (about 31 kB compressed) into the first load of every page, forms or not.
// tests/unit/zod-jitless.test.ts checks that zod still picks the setting up.
const zodGlobal = globalThis as { __zod_globalConfig?: Record<string, unknown> };
zodGlobal.__zod_globalConfig = { ...zodGlobal.__zod_globalConfig, jitless: true };
