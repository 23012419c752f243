import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithProviders } from "@/test/render";
import { methodsText } from "../report-text";
import type { Block } from "@waymark/contract";
import { CopyMethodsButton } from "./copy-methods-button";
import { ReportBlocks } from "./report-blocks";
import { ReportPage } from "./report-page";

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

// A 1×1 PNG.
const PNG =
  "data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==";

const BLOCKS: Block[] = [
  { type: "heading", level: 1, text: "Fertiliser trial" },
  { type: "heading", level: 2, text: "Methods" },
  { type: "heading", level: 3, text: "Choice of test" },
  {
    type: "paragraph",
    runs: [
      { text: "Welch's ANOVA was used; " },
      { text: "F", italic: true },
      { text: " is reported with " },
      { text: "undefined", bold: true },
      { text: " decimals." },
    ],
  },
  { type: "heading", level: 2, text: "Results" },
  {
    type: "table",
    caption: "Table 1. Descriptive statistics",
    header: ["Group", "n", "M", "SD"],
    rows: [
      ["A", "12", "4.20", "NaN"],
      ["B", "11", "5.10", ""],
    ],
  },
  { type: "figure", figure: "groups", caption: "Figure 1. Each group's values", image: PNG },
  { type: "caution", text: "The groups were not assigned at random; read differences as associations." },
  {
    type: "references",
    items: [
      "Delacre, M., Leys, C., Mora, Y. L., & Lakens, D. (2019). Taking parametric assumptions seriously.",
    ],
  },
];

describe("ReportBlocks", () => {
  it("renders headings, paragraphs, tables, figures, cautions and references from the blocks", () => {
    renderWithProviders(<ReportBlocks blocks={BLOCKS} />);
    expect(screen.getByRole("heading", { level: 2, name: "Fertiliser trial" })).toBeTruthy();
    expect(screen.getByRole("heading", { level: 3, name: "Methods" })).toBeTruthy();
    expect(screen.getByRole("heading", { level: 4, name: "Choice of test" })).toBeTruthy();
    expect(screen.getByText("F").tagName).toBe("EM");
    const table = screen.getByRole("table", { name: /Descriptive statistics/ });
    expect(
      within(table)
        .getAllByRole("columnheader")
        .map((h) => h.textContent),
    ).toEqual(["Group", "n", "M", "SD"]);
    expect(within(table).getAllByRole("row")).toHaveLength(3);
    const img = screen.getByRole("img", { name: "Figure 1. Each group's values" });
    expect(img.getAttribute("src")).toBe(PNG);
    expect(screen.getByText(/not assigned at random/)).toBeTruthy();
    expect(screen.getByText(/Delacre, M\./)).toBeTruthy();
  });

  it("never shows NaN or undefined", () => {
    renderWithProviders(<ReportBlocks blocks={BLOCKS} />);
    const text = screen.getByTestId("report-preview").textContent ?? "";
    expect(text).not.toMatch(/NaN|undefined|Infinity/);
  });

  it("does not load an image that is not an embedded PNG", () => {
    renderWithProviders(
      <ReportBlocks
        blocks={[
          { type: "figure", figure: "intervals", caption: "Figure 2", image: "https://example.org/x.png" },
        ]}
      />,
    );
    expect(screen.queryByRole("img")).toBeNull();
    expect(screen.getByText("The figure is in the DOCX.")).toBeTruthy();
  });
});

describe("methods text", () => {
  it("takes the blocks under the Methods heading up to Results", () => {
    const text = methodsText(BLOCKS)!;
    expect(text.startsWith("Choice of test\n\nWelch's ANOVA was used; F is reported with")).toBe(true);
    expect(text).not.toContain("Descriptive statistics");
    expect(text).not.toContain("Fertiliser trial");
  });

  it("copies it with the clipboard", async () => {
    const writeText = vi.fn(async () => undefined);
    vi.stubGlobal("navigator", { ...navigator, clipboard: { writeText } });
    renderWithProviders(<CopyMethodsButton blocks={BLOCKS} />);
    fireEvent.click(screen.getByRole("button", { name: "Copy methods as plain text" }));
    await waitFor(() => expect(writeText).toHaveBeenCalledWith(methodsText(BLOCKS)));
    expect(await screen.findByText("Copied.")).toBeTruthy();
  });
});

describe("ReportPage", () => {
  it("links the DOCX download and lists past downloads", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async (url: string) =>
        url.endsWith("/report/exports")
          ? new Response(
              JSON.stringify({
                exports: [
                  { id: 1, at: "2025-12-10T10:00:00Z", actorEmail: "writer@waymark.test", draft: false },
                ],
              }),
              { status: 200 },
            )
          : new Response(JSON.stringify({ report: { blocks: BLOCKS }, approved: true }), { status: 200 }),
      ),
    );
    renderWithProviders(<ReportPage studyId={5} />);
    const link = await screen.findByRole("link", { name: /Download DOCX/ });
    expect(link.getAttribute("href")).toBe("/api/studies/5/report.docx");
    expect(await screen.findByText("writer@waymark.test")).toBeTruthy();
  });

  it("says the report is not ready before approval", async () => {
    const message = "The report is available once the study is approved. The study has not been approved.";
    vi.stubGlobal(
      "fetch",
      vi.fn(
        async () => new Response(JSON.stringify({ error: { code: "conflict", message } }), { status: 409 }),
      ),
    );
    renderWithProviders(<ReportPage studyId={5} />);
    expect(await screen.findByText("The report is not ready")).toBeTruthy();
    expect(screen.getByText(message)).toBeTruthy();
  });
});
