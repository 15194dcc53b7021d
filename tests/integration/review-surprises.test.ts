/**
 * Review without surprises (issue 16): an edit during a review mails the
 * reviewers that it was withdrawn; a plan without channels cannot be
 * submitted, for every role that may submit; the refusal of a baseline names
 * its findings in words.
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, readMail, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

type Role = "owner" | "lead" | "engineer" | "viewer";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
const CAN_SUBMIT: Role[] = ["owner", "lead", "engineer"];

const cleanPlan = (name?: string) => {
  const p = JSON.parse(readFileSync(new URL("../../docs/examples/clean.plan.json", import.meta.url), "utf8"));
  if (name) p.name = name;
  return p;
};
const unique = (label: string) => `${label} ${Math.random().toString(36).slice(2, 8)}`;
const R = (id: string) => `/api/v1/missions/${id}/review`;

let team: TeamWithRoles;
beforeAll(async () => {
  team = await makeTeamWithRoles();
}, 120_000);
afterAll(closeTestPool);

describe("an edit during review", () => {
  it("withdraws the review and mails the leads and owners (not the person who edited)", async () => {
    const name = unique("Withdraw mail mission");
    const id = await missionWithPlan(team.engineer, cleanPlan(name));
    const since = new Date();
    expect((await call(team.engineer, "POST", `${R(id)}/submit`, {})).status).toBe(200);
    const submitted = (await call(team.owner, "GET", R(id))).body.revision.number as number;
    const s = await call(team.engineer, "GET", `/api/v1/missions/${id}/settings`);
    const edit = await call(team.engineer, "PUT", `/api/v1/missions/${id}/settings`, {
      ...s.body,
      updatedAt: undefined,
      guardMHz: s.body.guardMHz + 1,
    });
    expect(edit.status).toBe(200);
    expect((await call(team.owner, "GET", R(id))).body.state).toBe("draft");
    for (const reviewer of [team.lead, team.owner]) {
      const mail = await readMail(reviewer.email, `review withdrawn: ${name}, revision ${submitted}`);
      expect(mail.text).toContain(`${team.engineer.name} edited the plan "${name}"`);
      expect(mail.text).toContain(`draft revision ${submitted + 1}`);
      expect(mail.text).toContain(`/missions/${id}`);
    }
    const { rows } = await testPool().query(
      `select recipients from captured_mail where subject ilike $1 and received_at >= $2`,
      [`Review withdrawn: ${name}%`, since],
    );
    const all = rows.flatMap((r: { recipients: string[] }) => r.recipients);
    expect(all).not.toContain(team.engineer.email);
    expect(all).not.toContain(team.viewer.email);
  }, 120_000);

  it("an edit outside a review sends no withdrawal mail", async () => {
    const name = unique("No withdraw mission");
    const id = await missionWithPlan(team.engineer, cleanPlan(name));
    const s = await call(team.engineer, "GET", `/api/v1/missions/${id}/settings`);
    expect(
      (
        await call(team.engineer, "PUT", `/api/v1/missions/${id}/settings`, {
          ...s.body,
          updatedAt: undefined,
          guardMHz: s.body.guardMHz + 1,
        })
      ).status,
    ).toBe(200);
    await expect(readMail(team.lead.email, `review withdrawn: ${name}`, 1500)).rejects.toThrow(/no mail/);
  }, 60_000);
});

describe("a plan without channels cannot be submitted", () => {
  for (const role of ROLES)
    it(`as ${role}: ${CAN_SUBMIT.includes(role) ? "409 no-channels, and the plan stays a draft" : "403 before any check"}`, async () => {
      const plan = cleanPlan(unique("Empty plan"));
      plan.channels = [];
      const id = await missionWithPlan(team.owner, plan);
      const r = await call(team[role], "POST", `${R(id)}/submit`, {});
      if (CAN_SUBMIT.includes(role)) {
        expect(r.status).toBe(409);
        expect(r.body.error.code).toBe("no-channels");
        expect(r.body.error.message).toMatch(/no channels/);
      } else expect(r.status).toBe(403);
      expect((await call(team.owner, "GET", R(id))).body.state).toBe("draft");
    }, 60_000);
});

describe("the refusal of a baseline", () => {
  it("names each unwaived finding in words, not by its key", async () => {
    const id = await missionWithPlan(team.engineer, validPlanInput());
    expect((await call(team.engineer, "POST", `${R(id)}/submit`, {})).status).toBe(200);
    const refused = await call(team.lead, "POST", `${R(id)}/decide`, { decision: "baseline" });
    expect(refused.status).toBe(409);
    const issues = refused.body.error.issues as { path: string; message: string }[];
    expect(issues.length).toBeGreaterThan(0);
    for (const i of issues) {
      expect(i.message).toMatch(/^no waiver yet for chain \S+/);
      expect(i.message).not.toContain("|");
    }
  }, 60_000);
});

describe("@mentions", () => {
  it("by quoted full name and by the part of the address before the @ notify that member", async () => {
    const name = unique("Mention mission");
    const id = await missionWithPlan(team.engineer, cleanPlan(name));
    const local = team.lead.email.split("@")[0]!;
    const c = await call(team.engineer, "POST", `${R(id)}/comments`, {
      body: `@"${team.viewer.name}" and @${local}, please look.`,
    });
    expect(c.status).toBe(201);
    expect([...c.body.notified].sort()).toEqual([team.lead.email, team.viewer.email].sort());
    await readMail(team.lead.email, `mentioned you on ${name}`);
    await readMail(team.viewer.email, `mentioned you on ${name}`);
  }, 60_000);

  for (const role of CAN_SUBMIT)
    it(`as ${role}: an unknown name is a 400 naming the body field, and nothing is posted`, async () => {
      const id = await missionWithPlan(team.owner, cleanPlan(unique("Unknown mention")));
      const r = await call(team[role], "POST", `${R(id)}/comments`, { body: "@nobody-here please look" });
      expect(r.status).toBe(400);
      expect(r.body.error.issues).toEqual([
        {
          path: "body",
          message: "no team member is called @nobody-here. Mention team members by name or e-mail address.",
        },
      ]);
      expect((await call(team.viewer, "GET", `${R(id)}/comments`)).body.comments).toEqual([]);
    }, 60_000);

  it("as viewer: commenting stays 403 before any mention is read", async () => {
    const id = await missionWithPlan(team.owner, cleanPlan(unique("Viewer mention")));
    expect((await call(team.viewer, "POST", `${R(id)}/comments`, { body: "@nobody" })).status).toBe(403);
  }, 60_000);

  it("a first name several members share is refused with their names", async () => {
    const id = await missionWithPlan(team.owner, cleanPlan(unique("Shared name")));
    // Every test person is called "Test <address>": "@Test" fits all four.
    const r = await call(team.engineer, "POST", `${R(id)}/comments`, { body: "@Test hello" });
    expect(r.status).toBe(400);
    expect(r.body.error.issues[0].path).toBe("body");
    expect(r.body.error.issues[0].message).toMatch(/^@Test fits .* and .*: write the full name or the e-mail address/);
  }, 60_000);
});
