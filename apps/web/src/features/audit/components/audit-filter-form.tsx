import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { ACTION_LABELS } from "../actions";
import { EMPTY_FILTERS, type AuditFilters } from "../audit-query";

const ACTION_OPTIONS = [
  { value: "", label: "Any action" },
  ...Object.entries(ACTION_LABELS).map(([value, label]) => ({ value, label })),
];

/**
 * The filters of the audit trail; applying them changes the page's address. Give it a `key` of
 * the current query so it starts over when the address changes (back button, a shared link).
 */
export function AuditFilterForm({
  value,
  onApply,
}: {
  value: AuditFilters;
  onApply: (f: AuditFilters) => void;
}) {
  const [draft, setDraft] = useState(value);
  const [problem, setProblem] = useState<string | null>(null);
  const set = (k: keyof AuditFilters) => (e: { target: { value: string } }) =>
    setDraft((d) => ({ ...d, [k]: e.target.value }));
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (draft.studyId && !/^[1-9]\d*$/.test(draft.studyId.trim())) {
      setProblem("A study number is a whole number such as 12.");
      return;
    }
    if (draft.from && draft.to && draft.from > draft.to) {
      setProblem("The start date comes after the end date.");
      return;
    }
    setProblem(null);
    onApply({ ...draft, studyId: draft.studyId.trim(), actor: draft.actor.trim() });
  };
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Filter the audit trail"
      className="rounded-lg bg-paper p-4 shadow-sm"
    >
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
        <TextField
          label="Study number"
          inputMode="numeric"
          value={draft.studyId}
          onChange={set("studyId")}
          error={problem?.startsWith("A study") ? problem : undefined}
        />
        <TextField label="Person (e-mail contains)" value={draft.actor} onChange={set("actor")} />
        <SelectField label="Action" options={ACTION_OPTIONS} value={draft.action} onChange={set("action")} />
        <TextField
          label="From"
          type="date"
          value={draft.from}
          onChange={set("from")}
          error={problem?.startsWith("The start") ? problem : undefined}
        />
        <TextField label="To" type="date" value={draft.to} onChange={set("to")} />
      </div>
      <div className="mt-3 flex gap-2">
        <Button type="submit">Show events</Button>
        <Button
          variant="quiet"
          onClick={() => {
            setDraft(EMPTY_FILTERS);
            setProblem(null);
            onApply(EMPTY_FILTERS);
          }}
        >
          Clear filters
        </Button>
      </div>
    </form>
  );
}
