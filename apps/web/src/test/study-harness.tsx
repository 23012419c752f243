import { QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import type { ReactElement } from "react";
import { MemoryRouter } from "react-router-dom";
import { makeQueryClient } from "@/lib/query-client";
import { useStudy } from "@/features/studies/api/get-study";
import { studyKeys } from "@/lib/query-keys";
import type { StudyDto as Study } from "@waymark/contract";

function FromCache({ id, children }: { id: number; children: (s: Study) => ReactElement }) {
  const q = useStudy(id);
  return q.data ? children(q.data) : null;
}

/** Renders a component fed by the cached study, as the study page does, so saved answers flow back in. */
export function renderWithStudy(study: Study, children: (s: Study) => ReactElement) {
  const client = makeQueryClient();
  client.setQueryData(studyKeys.detail(study.id), study);
  return {
    client,
    ...render(
      <QueryClientProvider client={client}>
        <MemoryRouter>
          <FromCache id={study.id}>{children}</FromCache>
        </MemoryRouter>
      </QueryClientProvider>,
    ),
  };
}

/** A fetch stand-in that answers by route; unknown routes fail loudly. */
export function routeFetch(
  handler: (method: string, path: string, body: unknown) => { status?: number; body: unknown } | undefined,
) {
  return async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === "string" ? input : input.toString();
    const method = init?.method ?? "GET";
    const body = typeof init?.body === "string" ? (JSON.parse(init.body) as unknown) : undefined;
    const res = handler(method, url.replace(/^\/api/, ""), body);
    if (!res)
      return new Response(
        JSON.stringify({ error: { code: "not_found", message: `No mock for ${method} ${url}` } }),
        { status: 404 },
      );
    return new Response(JSON.stringify(res.body), { status: res.status ?? 200 });
  };
}
