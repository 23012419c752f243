import type { DataSource } from "typeorm";
import { policy } from "../../auth/policy.js";
import { actorOf } from "../../http/actor.js";
import type { RouteSpec } from "../../http/route-table.js";
import { parseBody } from "../../http/validate.js";
import { loadSettings } from "../organization/organization.routes.js";
import { assertReadable, listFilter } from "./study.access.js";
import { StudyResponseCache, serialize } from "./study-response-cache.js";
import { NotFoundError } from "../../http/errors.js";
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
  // Serialized list and study page responses, keyed by the database's change marker.
  const cache = new StudyResponseCache(ds);
  return [
    {
      method: "get",
      path: "",
      policy: ANY_ROLE,
      summary: "List studies (analysts: their own; writers: approved ones)",
      handlers: [
        async (req, res) => {
          // The list depends on the data and on which studies the caller's role shows (the key).
          const filter = listFilter(req.user!);
          const entry = await cache.get(`list:${JSON.stringify(filter)}`, async () =>
            serialize({ studies: await studyDtos(ds, await findStudies(ds, filter)) }),
          );
          cache.send(req, res, entry);
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
          const studyId = id(req.params.id);
          if (!Number.isInteger(studyId) || studyId <= 0)
            throw new NotFoundError(`There is no study ${studyId}.`);
          // The page is the same for every reader; who may read it is checked on each request.
          const entry = await cache.get(`study:${studyId}`, async () => {
            const study = (await findStudies(ds, { id: studyId }))[0];
            if (!study) throw new NotFoundError(`There is no study ${studyId}.`);
            const [dto] = await studyDtos(ds, [study]);
            return serialize({ study: dto }, { ownerId: study.ownerId, status: study.status });
          });
          assertReadable(entry.meta!, req.user!);
          cache.send(req, res, entry);
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
