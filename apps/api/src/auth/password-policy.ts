import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import * as common from "@zxcvbn-ts/language-common";

export const MIN_PASSWORD_LENGTH = 12;

// zxcvbn-ts ships a list of common and breached passwords and keyboard patterns (zxcvbn, Wheeler 2016).
const estimator = new ZxcvbnFactory({ dictionary: { ...common.dictionary }, graphs: common.adjacencyGraphs });

/** Why a new password is refused, or null when it is acceptable. */
export function passwordProblem(password: string, context: string[] = []): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) return `Use at least ${MIN_PASSWORD_LENGTH} characters.`;
  if (password.length > 200) return "Use at most 200 characters.";
  const result = estimator.check(password, context);
  if (result.score < 3)
    return "This password is too common or too easy to guess; try a longer phrase of unrelated words.";
  return null;
}
