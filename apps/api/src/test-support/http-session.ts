/**
 * A signed-in browser, reduced to what the API needs: one session cookie and the session's CSRF
 * token on every change. For tests against a real server process, where supertest's agent is
 * not at hand.
 */
export class HttpSession {
  private cookies = new Map<string, string>();
  private csrf = "";

  constructor(readonly baseUrl: string) {}

  static async signIn(baseUrl: string, email: string, password: string): Promise<HttpSession> {
    const s = new HttpSession(baseUrl);
    await s.refreshCsrf();
    await s.json("POST", "/api/auth/login", { email, password }, 200);
    await s.refreshCsrf();
    return s;
  }

  /** Fetched again after sign-in, because signing in gives the session a new id. */
  async refreshCsrf(): Promise<void> {
    const res = await this.request("GET", "/api/auth/csrf");
    this.csrf = ((await res.json()) as { token: string }).token;
  }

  async request(method: string, path: string, body?: BodyInit, headers: Record<string, string> = {}) {
    const res = await fetch(this.baseUrl + path, {
      method,
      body,
      headers: {
        ...headers,
        cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; "),
        ...(method === "GET" ? {} : { "x-csrf-token": this.csrf }),
      },
    });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const eq = pair!.indexOf("=");
      this.cookies.set(pair!.slice(0, eq).trim(), pair!.slice(eq + 1).trim());
    }
    return res;
  }

  /** Sends JSON and returns the parsed reply, failing with the API's own message on another status. */
  async json<T = Record<string, unknown>>(
    method: string,
    path: string,
    body?: unknown,
    expectStatus?: number,
  ): Promise<T> {
    const res = await this.request(
      method,
      path,
      body === undefined ? undefined : JSON.stringify(body),
      body === undefined ? {} : { "content-type": "application/json" },
    );
    const text = await res.text();
    if (expectStatus !== undefined && res.status !== expectStatus)
      throw new Error(`${method} ${path}: expected ${expectStatus}, got ${res.status}: ${text}`);
    return (text ? JSON.parse(text) : {}) as T;
  }

  /** A multipart upload of one CSV file in the field "file", with text fields beside it. */
  upload(path: string, csv: Buffer, fileName: string, fields: Record<string, string>) {
    const form = new FormData();
    for (const [k, v] of Object.entries(fields)) form.set(k, v);
    form.set("file", new Blob([new Uint8Array(csv)], { type: "text/csv" }), fileName);
    return this.request("POST", path, form);
  }
}
