import { createHash } from "node:crypto";
import type { Analysis } from "../analyses/analysis.entity.js";
import { SIGNED_POSTHOC_TEXT } from "../analyses/posthoc-signed-text.js";
import type { Study } from "../studies/study.entity.js";

/** JSON with object keys sorted at every level, so equal content always hashes the same. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value ?? null);
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
}

/** Everything an approval covers: if any of it changes, the signature no longer matches. */
export function approvalContent(study: Study, analysis: Analysis, datasetSha256: string) {
  return {
    study: {
      id: study.id,
      title: study.title,
      outcomeName: study.outcomeName,
      outcomeUnit: study.outcomeUnit,
      factorName: study.factorName,
      levels: study.levels,
      controlLevel: study.controlLevel,
      context: study.context,
      design: study.design,
      plan: study.plan,
      planLockedAt: study.planLockedAt ? new Date(study.planLockedAt).toISOString() : null,
    },
    dataset: { id: analysis.datasetId, sha256: datasetSha256 },
    analysis: {
      id: analysis.id,
      engineVersion: analysis.engineVersion,
      recommendedTest: analysis.recommendedTest,
      chosenTest: analysis.chosenTest,
      // Hashed in the wording signed before records kept ids, so older signatures still verify.
      posthocMethod: SIGNED_POSTHOC_TEXT[analysis.posthocMethod] ?? analysis.posthocMethod,
      overrideJustification: analysis.overrideJustification,
      result: analysis.result,
    },
  };
}

export function contentHash(content: unknown): string {
  return createHash("sha256").update(canonicalJson(content)).digest("hex");
}
