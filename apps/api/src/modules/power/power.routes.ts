import { anovaPower, anovaSampleSize, effectFFromMeans } from "@waymark/stats";
import { policy } from "../../auth/policy.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { powerSchema } from "./power.schema.js";

/** Stateless power calculator for the one-way ANOVA F test, with a curve for plotting. */
export function powerRoutes(): RouteSpec[] {
  return [
    {
      method: "post",
      path: "",
      policy: policy.signedIn,
      summary: "Power or n per group for the one-way ANOVA F test",
      handlers: [
        (req, res) => {
          const b = parseBody(powerSchema, req.body);
          const f = b.effectF ?? effectFFromMeans(b.means!, b.sd!);
          const n = b.n ?? anovaSampleSize({ k: b.k, f, alpha: b.alpha, power: b.power! }).nPerGroup;
          const power = anovaPower({ k: b.k, nPerGroup: n, f, alpha: b.alpha }).power;
          const top = Math.max(2 * n, 20);
          const step = Math.max(1, Math.ceil(top / 40));
          const curve = [];
          for (let m = 2; m <= top; m += step)
            curve.push({ n: m, power: anovaPower({ k: b.k, nPerGroup: m, f, alpha: b.alpha }).power });
          res.json({
            k: b.k,
            effectF: f,
            alpha: b.alpha,
            nPerGroup: n,
            totalN: n * b.k,
            power,
            targetPower: b.power ?? null,
            curve,
          });
        },
      ],
    },
  ];
}
