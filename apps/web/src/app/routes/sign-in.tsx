import { useState } from "react";
import { Navigate, useLocation, useNavigate } from "react-router-dom";
import { WaymarkLogo } from "@/components/ui/waymark-logo";
import { paths } from "@/config/paths";
import { useMe } from "@/lib/current-user";
import { usePublicConfig } from "@/features/auth/api/get-public-config";
import { DemoAccounts } from "@/features/auth/components/demo-accounts";
import { SignInForm } from "@/features/auth/components/sign-in-form";

export function SignInRoute() {
  const me = useMe();
  const config = usePublicConfig();
  const navigate = useNavigate();
  const location = useLocation();
  const [prefill, setPrefill] = useState<string>();
  const from = (location.state as { from?: string } | null)?.from ?? paths.home;

  if (me.data) return <Navigate to={from} replace />;

  return (
    <main className="grid min-h-screen place-items-center px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 flex items-center gap-3">
          <WaymarkLogo className="h-10 w-10" />
          <div>
            <h1 className="text-2xl font-semibold text-spruce">Waymark</h1>
            <p className="text-sm text-ink-soft">
              From a locked plan to a signed-off result, one marked step at a time.
            </p>
          </div>
        </div>
        <div className="rounded-lg border border-ink/10 bg-paper p-6 shadow-sm">
          <SignInForm prefillEmail={prefill} onSignedIn={() => navigate(from, { replace: true })} />
        </div>
        {config.data && (
          <div className="mt-4">
            <DemoAccounts config={config.data} onPick={setPrefill} />
          </div>
        )}
      </div>
    </main>
  );
}
