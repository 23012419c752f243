import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";

export interface MailMessage {
  id: number;
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export function getDevMail(): Promise<MailMessage[]> {
  return api.get<{ messages: MailMessage[] }>("/dev/mail").then((r) => r.messages);
}

/** The messages the local fake mail server caught, newest first; refreshed every few seconds. */
export const devMailQueryOptions = queryOptions({
  queryKey: ["dev", "mail"],
  queryFn: getDevMail,
  refetchInterval: 5000,
  staleTime: 0,
});

export function useDevMail() {
  return useQuery(devMailQueryOptions);
}
