import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { loadSettings } from "../organization/organization.routes.js";
import { loadReadableStudy } from "./study.access.js";
import { createStudySchema, designSchema, planSchema, updateStudySchema } from "./study.schema.js";
import {
  createStudy,
  lockPlan,
  saveDesign,
  savePlan,
  studyDto,
  studyDtos,
  updateStudy,
} from "./study.service.js";
import { findStudies } from "./study-list-records.js";

const ANY_ROLE = policy.roles("analyst", "reviewer", "writer", "admin");
const ANALYST = policy.roles("analyst");

export function studyRoutes(ds: DataSource): RouteSpec[] {
  const id = (raw: unknown) => Number(raw);
  return [
    {
      method: "get",
      path: "",
      policy: ANY_ROLE,
      summary: "List studies (analysts: their own; writers: approved ones)",
      handlers: [
        async (req, res) => {
          const user = req.user!;
          const studies = await findStudies(
            ds,
            user.role === "analyst"
              ? { ownerId: user.id }
              : user.role === "writer"
                ? { status: "approved" }
                : {},
          );
          res.json({ studies: await studyDtos(ds, studies) });
        },
      ],
    },
    {
      method: "post",
      path: "",
      policy: ANALYST,
      summary: "Create a study",
      handlers: [
        async (req, res) => {
          const input = parseBody(createStudySchema, req.body);
          // New plans start from the organization's test policy and defaults.
          const org = await loadSettings(ds);
          const study = await createStudy(ds, actorOf(req), input, {
            policy: org.policy,
            alpha: org.defaultAlpha,
            adjust: org.defaultAdjust,
          });
          res.status(201).json({ study: await studyDto(ds, study) });
        },
      ],
    },
    {
      method: "get",
      path: "/:id",
      policy: ANY_ROLE,
      summary: "One study with its design, plan and latest data",
      handlers: [
        async (req, res) => {
          const study = await loadReadableStudy(ds, id(req.params.id), req.user!);
          res.json({ study: (await studyDtos(ds, [study]))[0] });
        },
      ],
    },
    {
      method: "patch",
      path: "/:id",
      policy: ANALYST,
      summary: "Edit a draft study's details",
      handlers: [
        async (req, res) => {
          const study = await updateStudy(
            ds,
            actorOf(req),
            id(req.params.id),
            parseBody(updateStudySchema, req.body),
          );
          res.json({ study: await studyDto(ds, study) });
        },
      ],
    },
    {
      method: "put",
      path: "/:id/design",
      policy: ANALYST,
      summary: "Save design answers (until the plan is locked)",
      handlers: [
        async (req, res) => {
          const study = await saveDesign(
            ds,
            actorOf(req),
            id(req.params.id),
            parseBody(designSchema, req.body),
          );
          res.json({ study: await studyDto(ds, study) });
        },
      ],
    },
    {
      method: "put",
      path: "/:id/plan",
      policy: ANALYST,
      summary: "Save the analysis plan (until locked)",
      handlers: [
        async (req, res) => {
          const study = await savePlan(ds, actorOf(req), id(req.params.id), parseBody(planSchema, req.body));
          res.json({ study: await studyDto(ds, study) });
        },
      ],
    },
    {
      method: "post",
      path: "/:id/plan/lock",
      policy: ANALYST,
      summary: "Lock the plan with a timestamp",
      handlers: [
        async (req, res) => {
          const study = await lockPlan(ds, actorOf(req), id(req.params.id));
          res.json({ study: await studyDto(ds, study) });
        },
      ],
    },
  ];
}
