import { useMe } from "@/lib/current-user";
import { RoleHome } from "@/features/home/components/role-home";

export function HomeRoute() {
  const me = useMe();
  return me.data ? <RoleHome user={me.data} /> : null;
}
