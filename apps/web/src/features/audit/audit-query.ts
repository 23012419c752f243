/** The audit trail's filters, as they sit in the page's address so a view can be shared. */
export interface AuditFilters {
  studyId: string;
  actor: string;
  action: string;
  from: string;
  to: string;
}

export const FILTER_KEYS = [
  "studyId",
  "actor",
  "action",
  "from",
  "to",
] as const satisfies readonly (keyof AuditFilters)[];

const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Reads the filters from a query string, dropping values the server would refuse. */
export function filtersFromParams(params: URLSearchParams): AuditFilters {
  const get = (k: string) => (params.get(k) ?? "").trim();
  const studyId = get("studyId");
  const from = get("from");
  const to = get("to");
  return {
    studyId: /^[1-9]\d*$/.test(studyId) ? studyId : "",
    actor: get("actor").slice(0, 254),
    action: get("action").slice(0, 60),
    from: DATE.test(from) ? from : "",
    to: DATE.test(to) ? to : "",
  };
}

/** The filters that are set, as a query string without the "?" ("" when none are set). */
export function filtersToQuery(f: AuditFilters): string {
  const params = new URLSearchParams();
  for (const k of FILTER_KEYS) if (f[k]) params.set(k, f[k]);
  return params.toString();
}

export const EMPTY_FILTERS: AuditFilters = { studyId: "", actor: "", action: "", from: "", to: "" };
