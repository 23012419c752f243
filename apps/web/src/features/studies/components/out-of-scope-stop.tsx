import { Button } from "@/components/ui/button";

/** The study stops here: matched or repeated measurements need another family of methods. */
export function OutOfScopeStop({ reason, onRevise }: { reason?: string | null; onRevise?: () => void }) {
  return (
    <section
      role="status"
      aria-labelledby="oos-title"
      className="rounded-lg border-l-4 border-amber bg-amber-100 p-5"
    >
      <h3 id="oos-title" className="text-lg font-semibold text-amber-800">
        This study is outside what Waymark analyses
      </h3>
      <p className="mt-2 max-w-prose">
        When the same or matched units are measured in several groups, the measurements are linked, and the
        tests for independent groups would treat them as more information than they are. That design needs a
        different family of methods: <strong>repeated-measures ANOVA</strong> or a{" "}
        <strong>linear mixed model</strong> for a measured outcome, or the <strong>Friedman test</strong> for
        ranks.
      </p>
      {reason && <p className="mt-2 max-w-prose text-sm text-ink-soft">{reason}</p>}
      <p className="mt-2 max-w-prose">
        The path stops here. Talk to a statistician about the design, or change the answer if it was given by
        mistake.
      </p>
      {onRevise && (
        <Button variant="secondary" className="mt-4" onClick={onRevise}>
          Change this answer
        </Button>
      )}
    </section>
  );
}
