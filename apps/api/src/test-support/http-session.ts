import http from "node:http";

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

  /**
   * One request on a connection of its own (`agent: false`, so `Connection: close`): the server is
   * killed and restarted under this client, and a kept-alive socket to the dead process (or to one
   * closing it for idleness) would fail the next request by chance instead of by a fault.
   */
  async request(
    method: string,
    path: string,
    body?: BodyInit,
    headers: Record<string, string> = {},
  ): Promise<Response> {
    // Let the platform encode the body (JSON text, or multipart with its boundary), then send the bytes.
    const encoded = new Request(this.baseUrl + path, { method, body });
    const bytes = body === undefined ? undefined : Buffer.from(await encoded.arrayBuffer());
    const contentType = encoded.headers.get("content-type");
    const sent: Record<string, string> = {
      ...(contentType ? { "content-type": contentType } : {}),
      ...headers,
      cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; "),
      ...(method === "GET" ? {} : { "x-csrf-token": this.csrf }),
      ...(bytes ? { "content-length": String(bytes.length) } : {}),
    };
    const res = await new Promise<Response>((resolve, reject) => {
      const req = http.request(this.baseUrl + path, { method, headers: sent, agent: false }, (incoming) => {
        const chunks: Buffer[] = [];
        incoming.on("data", (c: Buffer) => chunks.push(c));
        incoming.on("error", reject);
        incoming.on("end", () => {
          const h = new Headers();
          for (let i = 0; i < incoming.rawHeaders.length; i += 2)
            h.append(incoming.rawHeaders[i]!, incoming.rawHeaders[i + 1]!);
          const status = incoming.statusCode ?? 0;
          const noBody = status === 204 || status === 304 || method === "HEAD";
          resolve(new Response(noBody ? null : Buffer.concat(chunks), { status, headers: h }));
        });
      });
      req.on("error", reject);
      req.end(bytes);
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
