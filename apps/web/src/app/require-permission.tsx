import type { ReactNode } from "react";
import { Outlet } from "react-router-dom";
import { ErrorPanel } from "@/components/errors/error-panel";
import { useMe } from "@/lib/current-user";
import { can, type Permission } from "@/lib/authorization";
import { ROLE_LABELS } from "@/lib/roles";

/**
 * Inside the signed-in area: shows its routes only to roles holding the permission, and tells
 * others plainly instead (the API refuses them too).
 */
export function RequirePermission({
  permission,
  children,
}: {
  permission: Permission;
  children?: ReactNode;
}) {
  const me = useMe();
  if (!me.data) return null;
  if (!can(me.data.role, permission))
    return (
      <ErrorPanel
        title="This page is not part of your role"
        message={`Signed in as ${ROLE_LABELS[me.data.role]}, you do not have access to this page. Use the menu above to find your own work.`}
      />
    );
  return <>{children ?? <Outlet />}</>;
}
