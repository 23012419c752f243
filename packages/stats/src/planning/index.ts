export * from "./anova-power.js";
export * from "./anova-sample-size.js";
export * from "./effect-f-from-means.js";
export * from "./power-curve.js";
export * from "./family-wise-error.js";
export * from "./simulated-power.js";
export * from "./plan-power.js";
