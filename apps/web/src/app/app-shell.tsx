import { NavLink, Outlet, useNavigate } from "react-router-dom";
import { Button } from "@/components/ui/button";
import { WaymarkLogo } from "@/components/ui/waymark-logo";
import { paths } from "@/config/paths";
import { useLogout } from "@/features/auth/api/logout";
import { usePublicConfig } from "@/features/auth/api/get-public-config";
import type { User } from "@/lib/current-user";
import { can } from "@/lib/authorization";
import { ROLE_LABELS } from "@/lib/roles";
import { NAV_ITEMS } from "./nav-items";

export function AppShell({ user }: { user: User }) {
  const logout = useLogout();
  const navigate = useNavigate();
  const config = usePublicConfig();
  const items = NAV_ITEMS.filter(
    (i) => can(user.role, i.permission) && (!i.demoOnly || config.data?.demo === true),
  );
  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-paper focus:p-2"
      >
        Skip to content
      </a>
      <header className="border-b-4 border-amber bg-spruce text-stone">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <NavLink
            to={paths.home}
            className="flex items-center gap-2 text-stone no-underline hover:no-underline"
          >
            <WaymarkLogo />
            <span className="text-lg font-semibold tracking-wide">Waymark</span>
          </NavLink>
          {/* Below md the menu takes its own row and wraps, so no page scrolls sideways at 390 px. */}
          <nav aria-label="Main" className="order-last flex w-full flex-wrap gap-1 md:order-none md:w-auto">
            {items.map((i) => (
              <NavLink
                key={i.to}
                to={i.to}
                end={i.end ?? true}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 text-sm text-stone no-underline hover:bg-spruce-700 hover:no-underline ${isActive ? "bg-spruce-700 font-semibold" : ""}`
                }
              >
                {i.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <div className="text-right text-sm leading-tight">
              <div className="font-medium" data-testid="signed-in-user">
                {user.displayName}
              </div>
              <div className="text-xs text-stone/80" data-testid="signed-in-role">
                {ROLE_LABELS[user.role]}
              </div>
            </div>
            <Button
              variant="secondary"
              className="!py-1.5"
              disabled={logout.isPending}
              onClick={() =>
                logout.mutate(undefined, { onSuccess: () => navigate(paths.signIn, { replace: true }) })
              }
            >
              Sign out
            </Button>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto min-w-0 max-w-6xl px-4 py-8">
        <Outlet />
      </main>
    </div>
  );
}
