import { CSRF_HEADER, existingToken } from "../../auth/csrf.js";
import { policy } from "../../auth/policy.js";
import type { Env } from "../../config/env.js";
import type { RouteSpec } from "../../http/route-table.js";
import { DEMO_USERS } from "../../db/seeds/demo-users.js";

/** What the sign-in page needs before anyone is signed in. Demo details only in demo mode. */
export function configRoutes(env: Env): RouteSpec[] {
  return [
    {
      method: "get",
      path: "",
      policy: policy.public,
      summary: "Public settings for the sign-in page",
      handlers: [
        // Hands on the session's CSRF token when there is one; an anonymous visitor gets none here
        // (a token is made only when asked for at /auth/csrf), so no session row is written.
        (req, res) => {
          const token = existingToken(req);
          if (token) res.setHeader(CSRF_HEADER, token);
          res.json(
            env.WAYMARK_DEMO
              ? {
                  demo: true,
                  demoPassword: env.demoPassword,
                  demoAccounts: DEMO_USERS.map(({ email, role }) => ({ email, role })),
                }
              : { demo: false },
          );
        },
      ],
    },
  ];
}
