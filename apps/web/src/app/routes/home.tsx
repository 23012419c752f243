import { useMe } from "@/lib/current-user";
import { RoleHome } from "@/features/home/components/role-home";
import { useStudies } from "@/features/studies/api/get-studies";

export function HomeRoute() {
  const me = useMe();
  const studies = useStudies();
  return me.data ? <RoleHome user={me.data} studies={studies.data} /> : null;
}
