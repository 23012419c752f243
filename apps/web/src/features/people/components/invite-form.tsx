import { useState } from "react";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { ROLE_LABELS, ROLES } from "@/lib/roles";
import { inviteInputSchema, useCreateInvitation, type InviteInput } from "../api/create-invitation";

const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Invites a person by e-mail with a role; they set their own name and password from the link. */
export function InviteForm() {
  const invite = useCreateInvitation();
  const [sent, setSent] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  return (
    <Form<InviteInput>
      schema={inviteInputSchema}
      defaultValues={{ email: "", role: "analyst" }}
      aria-label="Invite a person"
      className="flex flex-col gap-3"
      onSubmit={async (values, form) => {
        setSent(null);
        setRefusal(null);
        try {
          const inv = await invite.mutateAsync(values);
          setSent(
            `Invitation sent to ${inv.email} as ${ROLE_LABELS[inv.role] ?? inv.role}. The link works once and lasts 72 hours.`,
          );
          form.reset({ email: "", role: values.role });
        } catch (e) {
          setRefusal(e instanceof Error ? e.message : "The invitation was not sent.");
        }
      }}
    >
      {(form) => (
        <>
          <div className="grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start">
            <TextField
              label="E-mail"
              type="email"
              autoComplete="off"
              error={form.formState.errors.email?.message}
              {...form.register("email")}
            />
            <SelectField
              label="Role"
              options={ROLE_OPTIONS}
              error={form.formState.errors.role?.message}
              {...form.register("role")}
            />
            <Button type="submit" className="sm:mt-6" disabled={form.formState.isSubmitting}>
              {form.formState.isSubmitting ? "Sending…" : "Send invitation"}
            </Button>
          </div>
          {sent && (
            <p role="status" className="rounded-md bg-spruce-100 p-2 text-sm text-spruce">
              {sent}
            </p>
          )}
          {refusal && <ErrorPanel title="The invitation was not sent" message={refusal} />}
        </>
      )}
    </Form>
  );
}
