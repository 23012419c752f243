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
 * The only place the web app talks HTTP. Same-origin with the session cookie; errors become
 * ApiError carrying the server's message.
 */
export async function apiRequest<T>(method: string, path: string, body?: Json | FormData): Promise<T> {
  const isForm = typeof FormData !== "undefined" && body instanceof FormData;
  let res: Response;
  try {
    res = await fetch(`/api${path}`, {
      method,
      credentials: "same-origin",
      headers: body && !isForm ? { "content-type": "application/json", accept: "application/json" } : { accept: "application/json" },
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, "network", "Waymark's server could not be reached. Check your connection and try again.");
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data: unknown = text ? safeJson(text) : undefined;
  if (!res.ok) {
    const err = (data as ApiErrorBody | undefined)?.error;
    throw new ApiError(res.status, err?.code ?? "http_error", err?.message ?? `The server answered ${res.status}.`, err?.details);
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
export function uploadWithProgress<T>(path: string, form: FormData, onProgress?: (fraction: number) => void, signal?: AbortSignal): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress?.(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      onProgress?.(1);
      const data: unknown = xhr.responseText ? safeJson(xhr.responseText) : undefined;
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(data as T);
        return;
      }
      const err = (data as ApiErrorBody | undefined)?.error;
      reject(new ApiError(xhr.status, err?.code ?? "http_error", err?.message ?? uploadStatusMessage(xhr.status), err?.details));
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "Waymark's server could not be reached. Check your connection and try again."));
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
