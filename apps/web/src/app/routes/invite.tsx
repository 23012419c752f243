import { useNavigate, useParams } from "react-router-dom";
import { WaymarkLogo } from "@/components/ui/waymark-logo";
import { paths } from "@/config/paths";
import { AcceptInvitation } from "@/features/auth/components/accept-invitation";

/** Public: the page an invitation e-mail links to, outside the signed-in shell. */
export function InviteRoute() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  return (
    <main className="grid min-h-screen place-items-center px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 flex items-center gap-3">
          <WaymarkLogo className="h-10 w-10" />
          <span className="text-2xl font-semibold text-spruce">Waymark</span>
        </div>
        <AcceptInvitation token={token} onAccepted={() => navigate(paths.home, { replace: true })} />
      </div>
    </main>
  );
}
