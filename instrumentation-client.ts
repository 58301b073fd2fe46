// Runs in the browser before the app's own code. zod 4 compiles object schemas with
// `new Function` when it may; under our Content-Security-Policy (no 'unsafe-eval') its probe
// for that is refused and reported as a violation, though zod then parses without it. Turning
// the compiler off here keeps the policy strict and the reports meaningful.
import { z } from "zod";

z.config({ jitless: true });
