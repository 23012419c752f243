import http from "node:http";

export interface Reply {
  status: number;
  headers: http.IncomingHttpHeaders;
  text: string;
  /** The parsed JSON body (empty object when there is none or it is not JSON). */
  body: Record<string, unknown>;
  ms: number;
}

/**
 * One browser reduced to what the API needs: its cookies and the session's CSRF token, sent on
 * every request. Each request may go to another address (the proxy, or one instance directly)
 * with the same cookie, which is how the test shows a session is valid on either instance.
 */
export class Client {
  private cookies = new Map<string, string>();
  csrf = "";
  /** X-Served-By of each reply through the proxy, counted per server. */
  readonly servedBy = new Map<string, number>();
  private readonly agent: http.Agent | false;

  /**
   * When set, bodies of successful replies are read but neither kept nor parsed: the benchmark turns
   * it on after sign-in so the load generator spends its core on sending, not on parsing results.
   */
  discardBodies = false;

  constructor(
    readonly baseUrl: string,
    { keepAlive = false }: { keepAlive?: boolean } = {},
  ) {
    // The test kills servers under its clients: there a kept-alive socket to a dead process would fail
    // a later request by chance, so each request gets its own connection. The benchmark keeps them.
    this.agent = keepAlive ? new http.Agent({ keepAlive: true, maxSockets: 1 }) : false;
  }

  get cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async request(
    method: string,
    path: string,
    body?: Buffer | string,
    headers: Record<string, string> = {},
    baseUrl = this.baseUrl,
    timeoutMs = 180_000,
  ): Promise<Reply> {
    const sent: Record<string, string> = {
      accept: "application/json",
      ...headers,
      cookie: this.cookieHeader,
      ...(method === "GET" ? {} : { "x-csrf-token": this.csrf }),
      ...(body === undefined ? {} : { "content-length": String(Buffer.byteLength(body)) }),
    };
    const t0 = performance.now();
    const reply = await new Promise<Reply>((resolve, reject) => {
      const req = http.request(
        baseUrl + path,
        { method, headers: sent, agent: this.agent, timeout: timeoutMs },
        (res) => {
          const chunks: Buffer[] = [];
          const keep = !this.discardBodies || (res.statusCode ?? 0) >= 300;
          res.on("data", (c: Buffer) => void (keep && chunks.push(c)));
          res.on("error", reject);
          res.on("end", () => {
            const text = keep ? Buffer.concat(chunks).toString("utf8") : "";
            let parsed: Record<string, unknown> = {};
            try {
              parsed = text ? (JSON.parse(text) as Record<string, unknown>) : {};
            } catch {
              parsed = {};
            }
            resolve({
              status: res.statusCode ?? 0,
              headers: res.headers,
              text,
              body: parsed,
              ms: performance.now() - t0,
            });
          });
        },
      );
      req.on("timeout", () => req.destroy(new Error(`${method} ${path}: no answer within ${timeoutMs} ms`)));
      req.on("error", reject);
      req.end(body);
    });
    for (const c of [reply.headers["set-cookie"] ?? []].flat()) {
      const [pair] = c.split(";");
      const eq = pair!.indexOf("=");
      this.cookies.set(pair!.slice(0, eq).trim(), pair!.slice(eq + 1).trim());
    }
    const token = reply.headers["x-csrf-token"];
    if (typeof token === "string" && token) this.csrf = token;
    const server = reply.headers["x-served-by"];
    if (typeof server === "string") this.servedBy.set(server, (this.servedBy.get(server) ?? 0) + 1);
    return reply;
  }

  /** JSON in and out; fails with the API's own message when the status is not the expected one. */
  async json<T = Record<string, unknown>>(
    method: string,
    path: string,
    body?: unknown,
    expect?: number | number[],
    baseUrl = this.baseUrl,
  ): Promise<T> {
    const r = await this.request(
      method,
      path,
      body === undefined ? undefined : JSON.stringify(body),
      body === undefined ? {} : { "content-type": "application/json" },
      baseUrl,
    );
    const ok = expect === undefined ? r.status < 400 : [expect].flat().includes(r.status);
    if (!ok)
      throw new Error(
        `${method} ${baseUrl}${path}: expected ${String(expect ?? "< 400")}, got ${r.status}: ${r.text.slice(0, 400)}`,
      );
    return r.body as T;
  }

  /** A multipart upload of one CSV file in the field "file", with text fields beside it. */
  async upload(
    path: string,
    csv: Buffer,
    fileName: string,
    fields: Record<string, string>,
    baseUrl = this.baseUrl,
  ) {
    const boundary = `----waymark${Math.random().toString(16).slice(2)}`;
    const parts: Buffer[] = [];
    for (const [k, v] of Object.entries(fields))
      parts.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`));
    parts.push(
      Buffer.from(
        `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${fileName}"\r\nContent-Type: text/csv\r\n\r\n`,
      ),
      csv,
      Buffer.from(`\r\n--${boundary}--\r\n`),
    );
    return this.request(
      "POST",
      path,
      Buffer.concat(parts),
      { "content-type": `multipart/form-data; boundary=${boundary}` },
      baseUrl,
    );
  }

  /** GET /api/auth/csrf, then sign in; the reply's x-csrf-token header replaces the token. */
  async signIn(email: string, password: string, baseUrl = this.baseUrl): Promise<Reply> {
    const csrf = await this.json<{ token: string }>("GET", "/api/auth/csrf", undefined, 200, baseUrl);
    this.csrf = csrf.token;
    return this.request(
      "POST",
      "/api/auth/login",
      JSON.stringify({ email, password }),
      { "content-type": "application/json" },
      baseUrl,
    );
  }
}
