import { LIMITS } from "@waymark/contract";

// The request body comes from the one contract (@waymark/contract).
export { runAnalysisBody as runAnalysisSchema } from "@waymark/contract";

/** The shortest justification an override of the recommended test accepts (LIMITS.minJustification). */
export const MIN_JUSTIFICATION = LIMITS.minJustification;
