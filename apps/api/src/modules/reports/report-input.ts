import type { Analysis } from "../analyses/analysis.entity.js";
import type { Dataset } from "../datasets/dataset.entity.js";
import type { Signature } from "../reviews/signature.entity.js";
import type { Study } from "../studies/study.entity.js";

/** Everything a report is generated from: stored records only. */
export interface ReportInput {
  study: Study;
  dataset: Dataset;
  analysis: Analysis;
  signature: Signature | null;
  appVersion: string;
  generatedAt: Date;
  draft: boolean;
}
