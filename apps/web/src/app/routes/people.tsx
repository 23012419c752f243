import { PeoplePage } from "@/features/people/components/people-page";

export function PeopleRoute() {
  return <PeoplePage />;
}
