import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { filtersToQuery, type AuditFilters } from "../audit-query";

export interface AuditEvent {
  id: number;
  at: string;
  actorId?: number | null;
  actorEmail: string | null;
  action: string;
  studyId: number | null;
  ip: string | null;
  summary: string;
  before: unknown;
  after: unknown;
}

export function getAuditEvents(filters: AuditFilters): Promise<AuditEvent[]> {
  const qs = filtersToQuery(filters);
  return api.get<{ events: AuditEvent[] }>(`/audit${qs ? `?${qs}` : ""}`).then((r) => r.events);
}

export const auditEventsQueryOptions = (filters: AuditFilters) =>
  queryOptions({
    queryKey: ["audit", filters],
    queryFn: () => getAuditEvents(filters),
    placeholderData: keepPreviousData,
  });

export function useAuditEvents(filters: AuditFilters) {
  return useQuery(auditEventsQueryOptions(filters));
}

/** The CSV download of the same filtered trail: a plain link, not a fetch. */
export function auditCsvHref(filters: AuditFilters): string {
  const qs = filtersToQuery(filters);
  return `/api/audit/export.csv${qs ? `?${qs}` : ""}`;
}
