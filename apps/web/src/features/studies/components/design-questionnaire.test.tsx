import { fireEvent, screen, waitFor } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { DESIGN_QUESTIONS } from "../design-questions";
import { makeStudy } from "@/test/make-study";
import { renderWithStudy, routeFetch } from "@/test/study-harness";
import type { DesignAnswers, StudyDto as Study } from "@waymark/contract";
import { DesignQuestionnaire } from "./design-questionnaire";

afterEach(() => vi.unstubAllGlobals());

/** A server stand-in that stores answers the way the API does (paired → out of scope). */
function fakeServer(start: Study) {
  let study = start;
  const calls: DesignAnswers[] = [];
  const fetchMock = vi.fn(
    routeFetch((method, path, body) => {
      if (method === "PUT" && path === `/studies/${study.id}/design`) {
        calls.push(body as DesignAnswers);
        const design = { ...study.design, ...(body as DesignAnswers) };
        const outOfScope =
          design.independence === "paired" ? "The same units are measured in more than one group." : null;
        const complete =
          Object.keys(design).length === DESIGN_QUESTIONS.length &&
          !outOfScope &&
          design.independence !== "unsure";
        study = { ...study, design, outOfScope, designComplete: complete };
        return { body: { study } };
      }
      return undefined;
    }),
  );
  vi.stubGlobal("fetch", fetchMock);
  return { calls, fetchMock };
}

const legend = () => screen.getAllByRole("group")[0]!.querySelector("legend")!.textContent;

describe("DesignQuestionnaire", () => {
  it("shows one question per screen and saves each answer as it is given", async () => {
    const { calls } = fakeServer(makeStudy());
    renderWithStudy(makeStudy(), (s) => <DesignQuestionnaire study={s} />);
    expect(screen.getByText(`Question 1 of ${DESIGN_QUESTIONS.length}`)).toBeTruthy();
    expect(screen.getAllByRole("group")).toHaveLength(1);
    expect(legend()).toBe(DESIGN_QUESTIONS[0]!.question);
    expect(screen.getByText(/Why we ask:/)).toBeTruthy();

    const next = screen.getByRole("button", { name: "Next question" }) as HTMLButtonElement;
    expect(next.disabled).toBe(true);
    fireEvent.click(screen.getByLabelText(/Yes, independent groups/));
    await waitFor(() => expect(calls).toEqual([{ independence: "independent" }]));
    await waitFor(() => expect(next.disabled).toBe(false));
    fireEvent.click(next);
    expect(legend()).toBe(DESIGN_QUESTIONS[1]!.question);
    expect(screen.getByText(new RegExp(`Question 2 of ${DESIGN_QUESTIONS.length}`))).toBeTruthy();
  });

  it("the 'not sure' path says what to find out and what Waymark will assume", async () => {
    const start = makeStudy({ design: { independence: "independent" } });
    const { calls } = fakeServer(start);
    renderWithStudy(start, (s) => <DesignQuestionnaire study={s} />);
    expect(legend()).toBe(DESIGN_QUESTIONS[1]!.question);
    fireEvent.click(screen.getByLabelText(/Not sure/));
    await waitFor(() => expect(calls).toEqual([{ scale: "unsure" }]));
    expect(await screen.findByText("What to find out.")).toBeTruthy();
    expect(screen.getByText("What Waymark will assume.")).toBeTruthy();
    expect(screen.getByText(DESIGN_QUESTIONS[1]!.notSure.assume)).toBeTruthy();
    // "not sure" is an answer: the analyst may go on
    await waitFor(() =>
      expect((screen.getByRole("button", { name: "Next question" }) as HTMLButtonElement).disabled).toBe(
        false,
      ),
    );
  });

  it("matched units stop the path and name the methods that apply", async () => {
    fakeServer(makeStudy());
    renderWithStudy(makeStudy(), (s) => <DesignQuestionnaire study={s} />);
    fireEvent.click(screen.getByLabelText(/No, the same or matched units/));
    expect(await screen.findByText("This study is outside what Waymark analyses")).toBeTruthy();
    const stop = screen.getByRole("status");
    expect(stop.textContent).toMatch(/repeated-measures ANOVA/);
    expect(stop.textContent).toMatch(/linear mixed model/);
    expect(stop.textContent).toMatch(/Friedman test/);
    expect((screen.getByRole("button", { name: "Next question" }) as HTMLButtonElement).disabled).toBe(true);
  });

  it("comparisons against a control need a control group", () => {
    fakeServer(makeStudy());
    const start = makeStudy({
      design: {
        independence: "independent",
        scale: "continuous",
        question: "means",
        groupSizes: "equal",
        hasControl: "no",
      },
    });
    renderWithStudy(start, (s) => <DesignQuestionnaire study={s} />);
    expect(legend()).toBe(DESIGN_QUESTIONS.find((q) => q.key === "comparisons")!.question);
    expect((screen.getByLabelText(/Each group against the control/) as HTMLInputElement).disabled).toBe(true);
    expect(screen.getByText(/Needs a control group/)).toBeTruthy();
  });

  it("after the plan is locked the answers are shown, not editable", () => {
    const study = makeStudy({
      design: {
        independence: "independent",
        scale: "continuous",
        hasControl: "no",
        comparisons: "all-pairs",
        assignment: "randomized",
      },
      designComplete: true,
      plan: { ...makeStudy().plan, lockedAt: "2025-12-03T14:05:00.000Z" },
    });
    fakeServer(study);
    renderWithStudy(study, (s) => <DesignQuestionnaire study={s} />);
    expect(screen.queryByRole("radio")).toBeNull();
    expect(screen.queryByRole("button", { name: /Change/ })).toBeNull();
    expect(screen.getByText(/The answers are fixed/)).toBeTruthy();
    expect(screen.getByText("Independent groups")).toBeTruthy();
  });
});
