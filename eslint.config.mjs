import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const config = [
  ...nextVitals,
  ...nextTs,
  // Migrations are frozen in time and take Kysely<any>, as Kysely's docs advise: they must not follow today's table types.
  { files: ["migrations/**/*.ts"], rules: { "@typescript-eslint/no-explicit-any": "off" } },
  { ignores: [".next/**", ".next-*/**", "node_modules/**", "data/**", "test-results/**", "playwright-report/**", "next-env.d.ts", ".tmp/**"] },
];
export default config;
