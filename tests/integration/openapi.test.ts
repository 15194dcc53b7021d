/**
 * The OpenAPI description served by the running app: a valid OpenAPI 3.1
 * document (@seriousme/openapi-schema-validator), and the answers of every
 * read route and of the refusals match it (Ajv, JSON Schema 2020-12). The
 * mutation routes' answers are checked in api-tokens-roles.test.ts.
 */
import { Validator } from "@seriousme/openapi-schema-validator";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, createTeam, newVerifiedUser, TestClient } from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";
import { makeToken, OpenApiChecker, type TokenClient } from "./support/tokens";

let viewer: TokenClient;
// The served document; the tests read the fields they check.
let doc: any; // eslint-disable-line @typescript-eslint/no-explicit-any
let missionId = "";

beforeAll(async () => {
  const owner = await newVerifiedUser("openapi");
  const teamId = await createTeam(owner);
  missionId = await missionWithPlan(owner, validPlanInput());
  viewer = (await makeToken(owner, { teamId, role: "viewer" })).client;
  const r = await call(viewer, "GET", "/api/v1/openapi.json");
  expect(r.status).toBe(200);
  doc = r.body;
}, 120_000);
afterAll(closeTestPool);

describe("/api/v1/openapi.json", () => {
  it("is a valid OpenAPI 3.1 document with a bearer-token scheme", async () => {
    expect(doc.openapi).toBe("3.1.0");
    expect(await new Validator().validate(doc as never)).toEqual({ valid: true });
    expect(doc.components.securitySchemes.bearerToken).toEqual(
      expect.objectContaining({ type: "http", scheme: "bearer" }),
    );
  });

  it("needs a session or a token like every other route", async () => {
    expect((await call(new TestClient(), "GET", "/api/v1/openapi.json")).status).toBe(401);
  });

  it("the answers of every read route, and of refusals, match the description", async () => {
    const checker = new OpenApiChecker(doc as never);
    const m = `/api/v1/missions/${missionId}`;
    const kinds = ["lasers", "resonators", "detectors", "chains", "channels"];
    const first: Record<string, string> = {};
    for (const k of kinds) first[k] = (await call(viewer, "GET", `${m}/${k}`)).body[k][0].id;
    const comments = await call(viewer, "GET", `${m}/review/comments`);
    expect(comments.status).toBe(200);
    const paths = [
      "/api/v1/missions",
      m,
      `${m}/settings`,
      ...kinds.flatMap((k) => [`${m}/${k}`, `${m}/${k}/${first[k]}`]),
      `${m}/plan`,
      `${m}/result`,
      `${m}/revisions`,
      `${m}/revisions/1`,
      `${m}/revisions/2`,
      `${m}/findings?severity=error`,
      `${m}/activity`,
      `${m}/channels.csv`,
      `${m}/compare?from=1&to=2`,
      `${m}/review`,
      `${m}/review/comments`,
      `${m}/review/waivers`,
      "/api/v1/audit.csv",
      // refusals: another team's (or no) mission, a missing revision, bad query, a viewer writing
      "/api/v1/missions/00000000-0000-4000-8000-000000000000",
      `${m}/revisions/999`,
      `${m}/findings?severity=fatal`,
    ];
    const problems: string[] = [];
    for (const p of paths) {
      const r = await call(viewer, "GET", p);
      problems.push(...checker.problems("GET", p, r.status, r.headers.get("content-type"), r.body));
    }
    const refused = await call(viewer, "POST", "/api/v1/missions", { name: "no" });
    expect(refused.status).toBe(403);
    problems.push(
      ...checker.problems("POST", "/api/v1/missions", 403, refused.headers.get("content-type"), refused.body),
    );
    const check = await call(viewer, "POST", "/api/v1/check", validPlanInput());
    expect(check.status).toBe(200);
    problems.push(...checker.problems("POST", "/api/v1/check", 200, check.headers.get("content-type"), check.body));
    expect(problems).toEqual([]);
    expect(checker.checked).toBe(paths.length + 2);
  });
});
