import { Navigate, useLocation } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { AppShell } from "./app-shell";
import { paths } from "@/config/paths";
import { useMe } from "@/lib/current-user";

/** Signed-in area: sends signed-out visitors to sign in and back afterwards. */
export function RequireUser() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (me.isError)
    return (
      <div className="p-8">
        <ErrorPanel message={me.error.message} />
      </div>
    );
  if (!me.data) return <Navigate to={paths.signIn} replace state={{ from: location.pathname }} />;
  return <AppShell user={me.data} />;
}
