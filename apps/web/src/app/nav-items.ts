import { paths } from "@/config/paths";
import type { Permission } from "@/lib/authorization";

/** The main navigation; each entry is shown only to roles holding its permission. */
export const NAV_ITEMS: {
  to: string;
  label: string;
  permission: Permission;
  end?: boolean;
  demoOnly?: boolean;
}[] = [
  { to: paths.home, label: "Home", permission: "home:view", end: true },
  { to: paths.studies, label: "Studies", permission: "studies:view", end: false },
  { to: paths.reviews, label: "Review queue", permission: "reviews:view", end: false },
  { to: paths.audit, label: "Audit trail", permission: "audit:view" },
  { to: paths.people, label: "People", permission: "people:manage" },
  { to: paths.settings, label: "Settings", permission: "settings:manage" },
  { to: paths.reports, label: "Reports", permission: "reports:list", end: false },
  // Only when the server runs in demo mode (GET /api/config says so).
  { to: paths.devMailbox, label: "Mailbox", permission: "mailbox:view", demoOnly: true },
];
