import type { DesignQuestion } from "../design-questions";

/** The "not sure" path: what to find out, and what Waymark assumes until then. */
export function NotSurePanel({ question }: { question: DesignQuestion }) {
  return (
    <aside
      aria-label="If you are not sure"
      className="mt-4 rounded-md border-l-4 border-lake bg-paper p-4 text-sm"
    >
      <p>
        <span className="font-semibold">What to find out.</span> {question.notSure.findOut}
      </p>
      <p className="mt-2">
        <span className="font-semibold">What Waymark will assume.</span> {question.notSure.assume}
      </p>
    </aside>
  );
}
