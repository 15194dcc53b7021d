import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, TestClient, type TeamWithRoles } from "../setup/auth-helpers";

// GET /api/v1/schema/plan and /api/v1/schema/result against the running app (HETEROLANE_TEST_URL):
// public documentation (ADR 022), the same for everyone, cacheable, equal to the committed docs/schema files.
const committed = (name: string) =>
  JSON.parse(readFileSync(join(__dirname, `../../docs/schema/${name}.schema.json`), "utf8"));

describe("GET /api/v1/schema/{plan,result}", () => {
  let team: TeamWithRoles;
  beforeAll(async () => {
    team = await makeTeamWithRoles();
  });
  afterAll(async () => {
    await closeTestPool();
  });

  for (const name of ["plan", "result"]) {
    it(`${name}: 200 signed out, with the committed schema, as JSON Schema, cacheable`, async () => {
      const res = await new TestClient().fetch(`/api/v1/schema/${name}`);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toMatch(/^application\/schema\+json/);
      expect(res.headers.get("cache-control")).toMatch(/public/);
      expect(await res.json()).toEqual(committed(name));
    });

    it(`${name}: the same answer for every role (nothing team-specific in it)`, async () => {
      for (const person of [team.owner, team.lead, team.engineer, team.viewer]) {
        const res = await person.fetch(`/api/v1/schema/${name}`);
        expect(res.status).toBe(200);
        expect(await res.json()).toEqual(committed(name));
      }
    });
  }

  it("the plan schema names both versions; writing to it is not a route (405)", async () => {
    const body = await (await new TestClient().fetch("/api/v1/schema/plan")).json();
    expect(body.anyOf.map((s: { properties: { format: { const: string } } }) => s.properties.format.const)).toEqual([
      "heterolane.plan/2",
      "heterolane.plan/1",
    ]);
    const post = await new TestClient().fetch("/api/v1/schema/plan", { method: "POST", body: "{}" });
    expect(post.status).toBe(405);
  });
});
