/** Query keys of the reviews feature. The study detail key matches the one the study screens use. */
export const reviewKeys = {
  queue: ["reviews", "queue"] as const,
  history: (studyId: number) => ["studies", studyId, "history"] as const,
  studyDetail: (studyId: number) => ["studies", studyId] as const,
  studyList: ["studies"] as const,
};
