import type { DataSource } from "typeorm";
import type { Actor } from "../../http/actor.js";
import { ConflictError, ForbiddenError } from "../../http/errors.js";
import { APP_VERSION } from "../../version.js";
import { Analysis } from "../analyses/analysis.entity.js";
import { loadDatasetForAnalysis } from "../datasets/dataset.service.js";
import { verifyApproval } from "../reviews/review.service.js";
import { loadReadableStudy } from "../studies/study.access.js";
import { buildReport } from "./build-report.js";
import { groupsFigure, intervalsFigure } from "./figures.js";
import { intervalPairs } from "./posthoc-table.js";
import type { Block } from "./report-blocks.js";
import { activeDataset } from "../studies/study-status-records.js";

export interface GeneratedReport {
  blocks: Block[];
  images: Map<string, Buffer>;
  draft: boolean;
  title: string;
}

/**
 * Generates a study's report from stored records. The approved report needs a valid signature
 * (an approval whose hash still matches); a draft is for the owning analyst and is marked.
 */
export async function generateReport(
  ds: DataSource,
  actor: Actor,
  studyId: number,
  draft: boolean,
): Promise<GeneratedReport> {
  const study = await loadReadableStudy(ds, studyId, actor.user);
  let analysis: Analysis | null;
  let signature = null;
  if (draft) {
    if (actor.user.role !== "analyst" || study.ownerId !== actor.user.id)
      throw new ForbiddenError("Drafts are for the study's own analyst; others read the approved report.");
    // The draft shows what would be submitted: the newest analysis of the active data version.
    const active = await activeDataset(ds, study);
    analysis = active
      ? await ds
          .getRepository(Analysis)
          .findOne({ where: { studyId, datasetId: active.id }, order: { id: "DESC" } })
      : null;
    if (!analysis)
      throw new ConflictError(
        active
          ? `Data version ${active.version} is the active version and has no analysis yet; run the analysis on it before asking for a draft report.`
          : "Run the analysis before asking for a draft report.",
      );
  } else {
    if (actor.user.role === "analyst")
      throw new ForbiddenError(
        "Analysts download the watermarked draft (add ?draft=1); the approved report is for writers, reviewers and admins.",
      );
    const approval = await verifyApproval(ds, studyId);
    if (!approval.valid)
      throw new ConflictError(`The report is available once the study is approved. ${approval.reason}`);
    analysis = approval.analysis;
    signature = approval.signature;
  }
  const dataset = await loadDatasetForAnalysis(ds, studyId, analysis.datasetId);
  const blocks = buildReport({
    study,
    dataset,
    analysis,
    signature,
    appVersion: APP_VERSION,
    generatedAt: new Date(),
    draft,
  });
  const images = new Map<string, Buffer>();
  const label = `${study.outcomeName}${study.outcomeUnit ? ` (${study.outcomeUnit})` : ""}`;
  images.set(
    "groups",
    await groupsFigure(
      dataset.observations.groups.map((g) => ({ name: g.name, values: g.values.map(Number) })),
      label,
    ),
  );
  const pairs = intervalPairs(analysis.result.posthoc, analysis.posthocMethod);
  if (pairs.length > 0) images.set("intervals", await intervalsFigure(pairs, `Difference in ${label}`));
  return { blocks, images, draft, title: study.title };
}

/** The blocks with figures inlined as data URLs, for the web preview. */
export function previewBlocks(r: GeneratedReport): Block[] {
  return r.blocks
    .map((b) =>
      b.type === "figure" && r.images.has(b.figure)
        ? { ...b, image: `data:image/png;base64,${r.images.get(b.figure)!.toString("base64")}` }
        : b,
    )
    .filter((b) => b.type !== "figure" || b.image);
}
