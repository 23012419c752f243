export * from "./p-adjust.js";
export * from "./tukey-kramer.js";
export * from "./games-howell.js";
export * from "./dunn.js";
export * from "./control-comparisons.js";
