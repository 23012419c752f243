import { CSRF_HEADER, generateToken } from "../../auth/csrf.js";
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
        // The sign-in page loads this first: it hands the browser its CSRF token too.
        (req, res) =>
          void res.setHeader(CSRF_HEADER, generateToken(req)).json(
            env.WAYMARK_DEMO
              ? {
                  demo: true,
                  demoPassword: env.demoPassword,
                  demoAccounts: DEMO_USERS.map(({ email, role }) => ({ email, role })),
                }
              : { demo: false },
          ),
      ],
    },
  ];
}
