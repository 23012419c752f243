export * from "./normal.js";
export * from "./t.js";
export * from "./f.js";
export * from "./chi-square.js";
