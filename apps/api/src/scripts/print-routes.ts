import "reflect-metadata";
import { describePolicy } from "../auth/policy.js";
import { makeTestApp } from "../test-support/test-app.js";

/** Prints the route table as Markdown for DEVELOPERS.md: `npx tsx src/scripts/print-routes.ts`. */
const t = await makeTestApp();
console.log("| method | path | who | what |\n|---|---|---|---|");
for (const r of t.routes)
  console.log(`| ${r.method.toUpperCase()} | \`${r.path}\` | ${describePolicy(r.policy)} | ${r.summary} |`);
await t.services.stop();
process.exit(0);
