import type { PosthocFamily } from "@waymark/stats";

/**
 * The wording analyses stored for their post-hoc family before records kept ids (migration
 * 1764806400000 converted the rows). An approval's content hash covers this wording, so
 * signatures made before the conversion still verify; it is never shown to anyone.
 */
export const SIGNED_POSTHOC_TEXT: Record<PosthocFamily, string> = {
  "tukey-kramer": "Tukey–Kramer HSD",
  "games-howell": "Games–Howell",
  dunn: "Dunn",
  dunnett: "Dunnett",
  "welch-vs-control-holm": "Welch t-tests against the control, Holm-adjusted",
  "dunn-vs-control": "Dunn against the control",
};
