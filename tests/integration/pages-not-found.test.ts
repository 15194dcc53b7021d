/**
 * Pages of missions that are not the person's answer 404 (as the API does),
 * the app has its own icon, and the tools page lists every helper (issue 16).
 */
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  closeTestPool,
  makeTeamWithRoles,
  newVerifiedUser,
  createTeam,
  type TeamWithRoles,
  TestClient,
} from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";

type Role = "owner" | "lead" | "engineer" | "viewer";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
const PAGES = ["", "/lanes", "/report", "/compare", "/uploads"];

let team: TeamWithRoles;
let missionId: string;
let otherTeamMission: string;
const secretName = `Secret mission ${Math.random().toString(36).slice(2, 8)}`;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.owner, undefined);
  const stranger = await newVerifiedUser("stranger");
  await createTeam(stranger);
  otherTeamMission = await missionWithPlan(stranger, undefined, secretName);
}, 180_000);
afterAll(closeTestPool);

const page = (c: TestClient, path: string) => c.fetch(path, { headers: { accept: "text/html" } });

describe("unknown missions answer 404", () => {
  for (const role of ROLES)
    it(`as ${role}: every mission page of an unknown id, a malformed id and another team's mission is 404; the team's own is 200`, async () => {
      const c = team[role];
      for (const sub of PAGES) {
        for (const id of [randomUUID(), "not-a-mission", otherTeamMission]) {
          const res = await page(c, `/missions/${id}${sub}`);
          expect(res.status, `/missions/${id}${sub}`).toBe(404);
          const html = await res.text();
          expect(html).toContain("Not found");
          expect(html).not.toContain(secretName);
        }
      }
      const own = await page(c, `/missions/${missionId}`);
      expect(own.status).toBe(200);
      await own.text();
    }, 240_000);

  for (const role of ROLES)
    it(`as ${role}: the API answers 404 with a named error for an unknown mission`, async () => {
      const c = team[role];
      for (const path of ["", "/channels", "/plan", "/findings", "/review"]) {
        const r = await call(c, "GET", `/api/v1/missions/${randomUUID()}${path}`);
        expect(r.status, path).toBe(404);
        expect(r.body.error.code).toBe("not-found");
      }
    }, 120_000);

  it("signed out, an unknown mission page still goes to sign-in first (nothing is revealed)", async () => {
    const res = await new TestClient().fetch(`/missions/${randomUUID()}`);
    expect(res.status).toBeGreaterThanOrEqual(300);
    expect(res.status).toBeLessThan(400);
    expect(res.headers.get("location")).toContain("/sign-in");
  });
});

describe("the app's icon and the tools page", () => {
  it("serves its own SVG icon and links it from every page", async () => {
    const icon = await new TestClient().fetch("/icon.svg");
    expect(icon.status).toBe(200);
    expect(icon.headers.get("content-type")).toContain("image/svg+xml");
    expect(await icon.text()).toContain("<title>Heterolane</title>");
    const signIn = await (await new TestClient().fetch("/sign-in")).text();
    expect(signIn).toMatch(/<link rel="icon" href="\/icon\.svg[^"]*"/);
  });

  it("lists the channel-notation helper with the others on /tools", async () => {
    const html = await (await page(team.viewer, "/tools")).text();
    for (const title of [
      "Wavelength and grid",
      "Resonator sizing",
      "Drift budget",
      "Receiver noise",
      "Channel notation",
    ])
      expect(html).toContain(title);
    expect(html).toMatch(/<meta name="description" content="[^"]*channel notation/);
  });
});
