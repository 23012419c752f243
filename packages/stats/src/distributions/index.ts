export * from "./normal.js";
export * from "./t.js";
export * from "./f.js";
export * from "./chi-square.js";
export * from "./studentized-range.js";
export * from "./noncentral-f.js";
export * from "./dunnett.js";
export * from "./log10-tails.js";
