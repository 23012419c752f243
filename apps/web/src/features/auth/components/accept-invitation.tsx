import { useState } from "react";
import { Link } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextField } from "@/components/ui/text-field";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { fieldError } from "@/lib/field-error";
import { formatDateTime } from "@/lib/format";
import { ROLE_LABELS } from "@/lib/roles";
import {
  acceptInvitationSchema,
  MIN_PASSWORD_LENGTH,
  useAcceptInvitation,
  type AcceptInvitationInput,
} from "../api/accept-invitation";
import { useInvitation, type InvitationDetails } from "../api/get-invitation";

const GONE_TITLES: Record<string, string> = {
  invitation_not_found: "This invitation link does not work",
  invitation_used: "This invitation has been used",
  invitation_revoked: "This invitation was replaced",
  invitation_expired: "This invitation has expired",
};

/** The page for a link that no longer works: what happened and what to do, in the server's words. */
function InvitationGone({ error }: { error: ApiError }) {
  const title = GONE_TITLES[error.code] ?? "This invitation cannot be used";
  return (
    <div className="rounded-lg border border-ink/10 bg-paper p-6 shadow-sm" data-testid="invitation-gone">
      <h1 className="text-2xl font-semibold text-spruce">{title}</h1>
      <p className="mt-2">{error.message}</p>
      <p className="mt-4 text-sm">
        {error.code === "invitation_used" ? (
          <Link to={paths.signIn}>Go to the sign-in page</Link>
        ) : (
          <>
            Already have an account? <Link to={paths.signIn}>Sign in</Link>
          </>
        )}
      </p>
    </div>
  );
}

function AcceptForm({
  token,
  invitation,
  onAccepted,
}: {
  token: string;
  invitation: InvitationDetails;
  onAccepted: () => void;
}) {
  const accept = useAcceptInvitation(token);
  const [refusal, setRefusal] = useState<ApiError | Error | null>(null);
  if (refusal instanceof ApiError && refusal.status === 410) return <InvitationGone error={refusal} />;
  return (
    <div className="rounded-lg border border-ink/10 bg-paper p-6 shadow-sm">
      <h1 className="text-2xl font-semibold text-spruce">Join Waymark</h1>
      <p className="mt-2">
        You were invited as{" "}
        <span className="font-semibold">{ROLE_LABELS[invitation.role] ?? invitation.role}</span> with the
        address{" "}
        <span className="font-semibold" data-testid="invited-email">
          {invitation.email}
        </span>
        .
      </p>
      <p className="mt-1 text-sm text-ink-soft">
        The link works until {formatDateTime(invitation.expiresAt)}.
      </p>
      <Form<AcceptInvitationInput>
        schema={acceptInvitationSchema}
        defaultValues={{ displayName: "", password: "", confirm: "" }}
        aria-label="Create your account"
        className="mt-5 flex flex-col gap-4"
        onSubmit={async (v, form) => {
          setRefusal(null);
          try {
            await accept.mutateAsync({ displayName: v.displayName.trim(), password: v.password });
            onAccepted();
          } catch (e) {
            const f = fieldError(e);
            if (f && (f.field === "password" || f.field === "displayName"))
              form.setError(f.field, { message: f.message });
            else setRefusal(e instanceof Error ? e : new Error("The account was not created."));
          }
        }}
      >
        {(form) => (
          <>
            <TextField
              label="Your name"
              autoComplete="name"
              hint="As colleagues know you; it appears on your signatures."
              error={form.formState.errors.displayName?.message}
              {...form.register("displayName")}
            />
            <TextField
              label="Password"
              type="password"
              autoComplete="new-password"
              hint={`At least ${MIN_PASSWORD_LENGTH} characters. A phrase of unrelated words is easy to remember and hard to guess.`}
              error={form.formState.errors.password?.message}
              {...form.register("password")}
            />
            <TextField
              label="Password again"
              type="password"
              autoComplete="new-password"
              error={form.formState.errors.confirm?.message}
              {...form.register("confirm")}
            />
            {refusal && <ErrorPanel title="The account was not created" message={refusal.message} />}
            <Button type="submit" disabled={form.formState.isSubmitting}>
              {form.formState.isSubmitting ? "Creating your account…" : "Create account and sign in"}
            </Button>
          </>
        )}
      </Form>
    </div>
  );
}

/** Accepting an invitation: who it is for, then name and password; a dead link gets a clear page. */
export function AcceptInvitation({ token, onAccepted }: { token: string; onAccepted: () => void }) {
  const invitation = useInvitation(token);
  if (invitation.isPending) return <p className="text-ink-soft">Checking the invitation…</p>;
  if (invitation.error) {
    const e = invitation.error;
    if (e instanceof ApiError && (e.status === 404 || e.status === 410)) return <InvitationGone error={e} />;
    return <ErrorPanel title="The invitation could not be checked" message={e.message} />;
  }
  return <AcceptForm token={token} invitation={invitation.data} onAccepted={onAccepted} />;
}
