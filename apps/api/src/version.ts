import { createRequire } from "node:module";

const require = createRequire(import.meta.url);

/** The API's version, from its package.json so there is one source. */
export const APP_VERSION: string = (require("../package.json") as { version: string }).version;
