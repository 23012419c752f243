export * from "./hedges-g.js";
export * from "./rank-biserial.js";
export * from "./eta-squared-ci.js";
