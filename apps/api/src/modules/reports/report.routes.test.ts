import JSZip from "jszip";
import request from "supertest";
import { formatStat, formatUnit } from "@waymark/stats";
import { beforeAll, describe, expect, it } from "vitest";
import { seedDemoStudies } from "../../db/seeds/demo-studies.js";
import { signedIn } from "../../test-support/agents.js";
import { makeTestApp } from "../../test-support/test-app.js";
import { REFERENCES } from "./references.js";

let t: Awaited<ReturnType<typeof makeTestApp>>;
let analyst: Awaited<ReturnType<typeof signedIn>>;
let reviewer: Awaited<ReturnType<typeof signedIn>>;
let writer: Awaited<ReturnType<typeof signedIn>>;
let studies: { id: number; title: string; latestAnalysisId: number }[];

/** Reads a DOCX back: the text of word/document.xml, the header text and the embedded media. */
async function readDocx(buf: Buffer) {
  const zip = await JSZip.loadAsync(buf);
  const xml = await zip.file("word/document.xml")!.async("string");
  const headers = await Promise.all(
    Object.keys(zip.files)
      .filter((f) => /^word\/header\d*\.xml$/.test(f))
      .map((f) => zip.file(f)!.async("string")),
  );
  const entities: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'" };
  const decode = (x: string) => x.replace(/&(amp|lt|gt|quot|apos);/g, (_, e: string) => entities[e]!);
  const text = (x: string) =>
    [...x.matchAll(/<w:t(?: [^>]*)?>([^<]*)<\/w:t>/g)].map((m) => decode(m[1]!)).join("");
  const paragraphs = xml.split("</w:p>").map(text).filter(Boolean);
  return {
    xml,
    text: paragraphs.join("\n"),
    headers: headers.map(text).join("\n"),
    media: Object.keys(zip.files).filter((f) => f.startsWith("word/media/")),
    fonts: Object.keys(zip.files).filter((f) => f.startsWith("word/fonts/")),
  };
}

const binary = (res: request.Response, cb: (e: Error | null, b: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on("data", (c: Buffer) => chunks.push(c));
  res.on("end", () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoStudies(t.ds, t.env.demoPassword);
  analyst = await signedIn(t.app, "analyst", t.env.demoPassword);
  reviewer = await signedIn(t.app, "reviewer", t.env.demoPassword);
  writer = await signedIn(t.app, "writer", t.env.demoPassword);
  // The demo's analysed studies (one approved, one in review, one sent back), the draft-able one first.
  studies = (await analyst.get("/api/studies").expect(200)).body.studies
    .filter((s: { latestAnalysisId: number | null }) => s.latestAnalysisId !== null)
    .sort((a: { status: string }, b: { status: string }) =>
      a.status === "draft" ? -1 : b.status === "draft" ? 1 : 0,
    );
}, 120_000);

describe("report rules", () => {
  it("is 401 signed out, 403 for an analyst without draft, 403 for a writer before approval", async () => {
    const id = studies[0]!.id;
    await request(t.app).get(`/api/studies/${id}/report.docx`).expect(401);
    const a = await analyst.get(`/api/studies/${id}/report.docx`).expect(403);
    expect(a.body.error.message).toMatch(/draft=1/);
    const w = await writer.get(`/api/studies/${id}/report.docx`).expect(403);
    expect(w.body.error.message).toMatch(/Writers see approved studies only/);
  });

  it("gives the analyst a draft marked as not approved on every page", async () => {
    const res = await analyst
      .get(`/api/studies/${studies[0]!.id}/report.docx?draft=1`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    const doc = await readDocx(res.body as Buffer);
    expect(doc.headers).toMatch(/NOT APPROVED/);
    expect(doc.text).toMatch(/Draft — not approved/);
  });
});

describe("approved reports of the three demo studies", () => {
  it("hold the stored numbers, the methods' references, the figures and the sign-off", async () => {
    expect(studies).toHaveLength(3);
    for (const s of studies) {
      const status = (await analyst.get(`/api/studies/${s.id}`).expect(200)).body.study.status;
      if (status === "draft") await analyst.post(`/api/studies/${s.id}/submit`).send({}).expect(200);
      if (status !== "approved")
        await reviewer
          .post(`/api/studies/${s.id}/approve`)
          .send({ password: t.env.demoPassword, meaning: "Approved as the analysis of record" })
          .expect(200);
      const analysis = (await writer.get(`/api/studies/${s.id}/analyses/${s.latestAnalysisId}`).expect(200))
        .body.analysis;
      const res = await writer.get(`/api/studies/${s.id}/report.docx`).buffer(true).parse(binary).expect(200);
      const doc = await readDocx(res.body as Buffer);
      for (const h of [
        "Methods",
        "Results",
        "Sign-off",
        "References",
        "Assumption checks",
        "Post-hoc comparisons",
      ])
        expect(doc.text).toContain(h);
      expect(doc.text).not.toMatch(/NaN|undefined|\[object|Infinity/);
      expect(doc.media.length).toBeGreaterThanOrEqual(1);
      expect(doc.fonts.length).toBeGreaterThanOrEqual(1);
      expect(doc.text).toContain(analysis.result.data ? `${s.title}` : s.title);
      // The omnibus statistic in the text is the stored one.
      const r = analysis.result;
      const stat =
        analysis.chosenTest === "anova"
          ? r.anova.F
          : analysis.chosenTest === "welch"
            ? r.welch.F
            : r.kruskalWallis.H;
      expect(doc.text).toContain(formatStat(stat).replace("-", "\u2212"));
      // The post-hoc table carries the stored effect sizes (Hedges' g, or the rank-biserial r for Dunn).
      const family =
        analysis.chosenTest === "anova"
          ? r.posthoc.tukey
          : analysis.chosenTest === "welch"
            ? r.posthoc.gamesHowell
            : (r.posthoc.control?.dunn ?? r.posthoc.dunn);
      const first = family[0];
      if (analysis.chosenTest === "kruskal-wallis")
        expect(doc.text).toContain(formatUnit(first.rankBiserial.r));
      else expect(doc.text).toContain(formatStat(first.hedgesG.g));
      // Each group's mean in Table 1 is the stored mean.
      for (const g of r.groups) expect(doc.text).toContain(formatStat(g.mean));
      // References match the methods used, and only those.
      const chosenRef = {
        anova: REFERENCES.fisher,
        welch: REFERENCES.welch,
        "kruskal-wallis": REFERENCES.kruskal,
      }[analysis.chosenTest as "anova" | "welch" | "kruskal-wallis"];
      expect(doc.text).toContain(chosenRef);
      if (analysis.chosenTest !== "kruskal-wallis") expect(doc.text).not.toContain(REFERENCES.kruskal);
      if (analysis.chosenTest !== "welch" && analysis.posthocMethod !== "welch-vs-control-holm")
        expect(doc.text).not.toContain(REFERENCES.welch);
      expect(doc.text).toMatch(/Approved by Rui Takahashi/);
      expect(doc.headers).not.toMatch(/NOT APPROVED/);
    }
    const exports = await writer.get(`/api/studies/${studies[0]!.id}/report/exports`).expect(200);
    expect(exports.body.exports.length).toBeGreaterThanOrEqual(1);
  }, 120_000);

  it("shows the same content in the HTML preview", async () => {
    const res = await writer.get(`/api/studies/${studies[0]!.id}/report/preview`).expect(200);
    const headings = res.body.report.blocks
      .filter((b: { type: string }) => b.type === "heading")
      .map((b: { text: string }) => b.text);
    expect(headings).toEqual(expect.arrayContaining(["Methods", "Results", "Sign-off", "References"]));
    expect(
      res.body.report.blocks.some(
        (b: { type: string; image?: string }) =>
          b.type === "figure" && b.image?.startsWith("data:image/png;base64,"),
      ),
    ).toBe(true);
  });
});
