/** The API's one error shape. */
export interface ApiErrorBody {
  error: { code: string; message: string; details?: unknown };
}

/** An API failure with the server's message, ready to show to the user. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

type Json = Record<string, unknown> | unknown[];

/**
 * The session's CSRF token. The server sends it as an `x-csrf-token` response header (on
 * /auth/me and sign-in, and on /config once a session has one); every state-changing request
 * echoes it back. An anonymous visitor has none until the first change is refused and the
 * token is fetched below, because the server makes tokens only when asked for them.
 */
const CSRF_HEADER = "x-csrf-token";
let csrfToken: string | null = null;

function rememberToken(value: string | null): void {
  if (value) csrfToken = value;
}

async function refreshToken(): Promise<void> {
  const res = await fetch("/api/auth/csrf", {
    credentials: "same-origin",
    headers: { accept: "application/json" },
  });
  const data = safeJson(await res.text()) as { token?: string } | undefined;
  csrfToken = data?.token ?? null;
}

const isCsrfRefusal = (status: number, data: unknown) =>
  status === 403 && (data as ApiErrorBody | undefined)?.error?.code === "csrf_invalid";

/**
 * The only place the web app talks HTTP. Same-origin with the session cookie; errors become
 * ApiError carrying the server's message.
 */
export async function apiRequest<T>(
  method: string,
  path: string,
  body?: Json | FormData,
  retried = false,
): Promise<T> {
  const isForm = typeof FormData !== "undefined" && body instanceof FormData;
  const headers: Record<string, string> =
    body && !isForm
      ? { "content-type": "application/json", accept: "application/json" }
      : { accept: "application/json" };
  if (method !== "GET" && csrfToken) headers[CSRF_HEADER] = csrfToken;
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      method,
      credentials: "same-origin",
      headers,
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(
      0,
      "network",
      "Waymark's server could not be reached. Check your connection and try again.",
    );
  }
  rememberToken(res.headers?.get?.(CSRF_HEADER) ?? null);
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data: unknown = text ? safeJson(text) : undefined;
  // A new session (after sign-out or a timeout) has a new token: fetch it and try once more.
  if (!retried && isCsrfRefusal(res.status, data)) {
    await refreshToken();
    return apiRequest<T>(method, path, body, true);
  }
  if (!res.ok) {
    const err = (data as ApiErrorBody | undefined)?.error;
    throw new ApiError(
      res.status,
      err?.code ?? "http_error",
      err?.message ?? `The server answered ${res.status}.`,
      err?.details,
    );
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/**
 * Sends a multipart form with upload progress (0–1) reported as the bytes go out. The one use of
 * XMLHttpRequest in the app: fetch cannot report upload progress. Same errors as apiRequest.
 */
export function uploadWithProgress<T>(
  path: string,
  form: FormData,
  onProgress?: (fraction: number) => void,
  signal?: AbortSignal,
  retried = false,
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader("accept", "application/json");
    if (csrfToken) xhr.setRequestHeader(CSRF_HEADER, csrfToken);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress?.(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      onProgress?.(1);
      const data: unknown = xhr.responseText ? safeJson(xhr.responseText) : undefined;
      if (!retried && isCsrfRefusal(xhr.status, data)) {
        refreshToken()
          .then(() => uploadWithProgress<T>(path, form, onProgress, signal, true))
          .then(resolve, reject);
        return;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(data as T);
        return;
      }
      const err = (data as ApiErrorBody | undefined)?.error;
      reject(
        new ApiError(
          xhr.status,
          err?.code ?? "http_error",
          err?.message ?? uploadStatusMessage(xhr.status),
          err?.details,
        ),
      );
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          "network",
          "Waymark's server could not be reached. Check your connection and try again.",
        ),
      );
    xhr.onabort = () => reject(new ApiError(0, "aborted", "The upload was cancelled."));
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.send(form);
  });
}

function uploadStatusMessage(status: number): string {
  if (status === 413) return "The file is larger than the server accepts.";
  if (status === 415) return "The server accepts CSV or XLSX files only.";
  return `The server answered ${status}.`;
}

export const api = {
  get: <T>(path: string) => apiRequest<T>("GET", path),
  post: <T>(path: string, body?: Json | FormData) => apiRequest<T>("POST", path, body),
  put: <T>(path: string, body?: Json) => apiRequest<T>("PUT", path, body),
  patch: <T>(path: string, body?: Json) => apiRequest<T>("PATCH", path, body),
  delete: <T>(path: string) => apiRequest<T>("DELETE", path),
};
