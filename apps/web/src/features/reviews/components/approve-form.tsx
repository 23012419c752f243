import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextArea } from "@/components/ui/text-area";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-client";
import {
  approveInputSchema,
  DEFAULT_MEANING,
  useApproveStudy,
  type ApproveInput,
} from "../api/approve-study";

/**
 * The electronic signature: the reviewer re-enters their password and states what the signature
 * means. A wrong password is shown under the password; any other refusal (for example separation
 * of duties) above the button, both in the server's words.
 */
export function ApproveForm({
  studyId,
  signerName,
  onApproved,
}: {
  studyId: number;
  signerName: string;
  onApproved?: () => void;
}) {
  const approve = useApproveStudy(studyId);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <Form<ApproveInput>
      schema={approveInputSchema}
      defaultValues={{ password: "", meaning: DEFAULT_MEANING }}
      aria-label="Approve with your signature"
      className="flex flex-col gap-4"
      onSubmit={async (values, form) => {
        setRefusal(null);
        try {
          await approve.mutateAsync(values);
          onApproved?.();
        } catch (e) {
          if (e instanceof ApiError && e.code === "signature_rejected") {
            form.setError("password", { message: e.message });
            form.setValue("password", "");
          } else {
            setRefusal(e instanceof Error ? e.message : "The approval was not recorded.");
          }
        }
      }}
    >
      {(form) => (
        <>
          <div className="rounded-md bg-stone p-3 text-sm" data-testid="signature-explainer">
            <p className="font-semibold">What signing means</p>
            <p className="mt-1">
              Your signature makes this analysis the approved analysis of record. Waymark records your name (
              {signerName}), the time, the meaning you state below, and a SHA-256 hash of exactly what you
              approve: the plan, the data version and the analysis. If any of them changes later, the approval
              no longer holds and the study must be reviewed again.
            </p>
          </div>
          <TextArea
            label="Meaning of your signature"
            rows={2}
            hint="Say in your own words what you are approving."
            error={form.formState.errors.meaning?.message}
            {...form.register("meaning")}
          />
          <TextField
            label="Your password"
            type="password"
            autoComplete="current-password"
            hint="Re-enter the password you sign in with; it confirms that the signature is yours."
            error={form.formState.errors.password?.message}
            {...form.register("password")}
          />
          {refusal && <ErrorPanel title="The approval was not recorded" message={refusal} />}
          <Button type="submit" disabled={form.formState.isSubmitting}>
            {form.formState.isSubmitting ? "Signing…" : "Sign and approve"}
          </Button>
        </>
      )}
    </Form>
  );
}
