import { paths } from "@/config/paths";
import type { Permission } from "@/lib/authorization";

/** The main navigation; each entry is shown only to roles holding its permission. */
export const NAV_ITEMS: { to: string; label: string; permission: Permission }[] = [{ to: paths.home, label: "Home", permission: "home:view" }];
