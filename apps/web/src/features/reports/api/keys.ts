/** Query keys of the reports feature; the studies list key is the one the study screens use. */
export const reportKeys = {
  studies: ["studies"] as const,
  preview: (studyId: number, draft: boolean) =>
    ["studies", studyId, "report", "preview", draft ? "draft" : "approved"] as const,
  exports: (studyId: number) => ["studies", studyId, "report", "exports"] as const,
};

export const reportDocxHref = (studyId: number, draft = false) =>
  `/api/studies/${studyId}/report.docx${draft ? "?draft=1" : ""}`;
