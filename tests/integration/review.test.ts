/**
 * The review workflow over HTTP against the running app and the real
 * PostgreSQL: every transition × every role (table-driven, from every
 * state), waivers against open errors, comments with @mentions, the e-mails
 * read back from `captured_mail`, notification preferences, comparison,
 * the audit CSV, and the error statuses (400/401/403/404/409).
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  closeTestPool,
  createTeam,
  makeTeamWithRoles,
  newVerifiedUser,
  readMail,
  TestClient,
  testPool,
  type TeamWithRoles,
} from "../setup/auth-helpers";
import { call, callRaw, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

type Role = "owner" | "lead" | "engineer" | "viewer";
type State = "draft" | "in-review" | "baselined" | "changes-requested";
type Action = "submit" | "baseline" | "request-changes" | "edit";
const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
const STATES: State[] = ["draft", "in-review", "baselined", "changes-requested"];
const ACTIONS: Action[] = ["submit", "baseline", "request-changes", "edit"];

// The clean example plan (no error findings; invented demo data). (Worked example 1 was clean until the
// format's version 2 counted its ±20 MHz LO drift: it now has two errors, ADR 022.)
// Importing a plan names the mission after the plan, so tests that look for a mission by name rename the plan.
const cleanPlan = (name?: string) => {
  const p = JSON.parse(readFileSync(new URL("../../docs/examples/clean.plan.json", import.meta.url), "utf8"));
  if (name) p.name = name;
  return p;
};
const unique = (label: string) => `${label} ${Math.random().toString(36).slice(2, 8)}`;
const latestNumber = async (id: string): Promise<number> => (await call(team.owner, "GET", R(id))).body.revision.number;

let team: TeamWithRoles;
const signedOut = new TestClient();
let outsider: TestClient;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  outsider = await newVerifiedUser("outsider");
  await createTeam(outsider);
});
afterAll(closeTestPool);

const R = (id: string) => `/api/v1/missions/${id}/review`;
const state = async (id: string): Promise<State> => (await call(team.owner, "GET", R(id))).body.state;

/** Performs one workflow action as `c` (edit = change a setting, which stores a new revision). */
async function act(c: TestClient, id: string, action: Action) {
  if (action === "submit") return call(c, "POST", `${R(id)}/submit`, { note: "please review" });
  if (action === "edit") {
    const s = await call(team.owner, "GET", `/api/v1/missions/${id}/settings`);
    return call(c, "PUT", `/api/v1/missions/${id}/settings`, {
      ...s.body,
      updatedAt: undefined,
      guardMHz: s.body.guardMHz + 1,
    });
  }
  return call(c, "POST", `${R(id)}/decide`, { decision: action, note: "decided in a test" });
}

/** A mission with the clean plan, driven by the owner into `s`. */
async function missionIn(s: State): Promise<string> {
  const id = await missionWithPlan(team.owner, cleanPlan());
  const path: Record<State, Action[]> = {
    draft: [],
    "in-review": ["submit"],
    baselined: ["submit", "baseline"],
    "changes-requested": ["submit", "request-changes"],
  };
  for (const a of path[s]) {
    const r = await act(team.owner, id, a);
    if (r.status !== 200) throw new Error(`preparing ${s}: ${a} answered ${r.status} ${r.text}`);
  }
  expect(await state(id)).toBe(s);
  return id;
}

// Hand-written expectations (docs/permissions.md and docs/decisions/016-review-readings.md), independent of src/lib/review.
const MAY: Record<Action, Role[]> = {
  submit: ["owner", "lead", "engineer"],
  baseline: ["owner", "lead"],
  "request-changes": ["owner", "lead"],
  edit: ["owner", "lead", "engineer"],
};
const NEXT: Record<Action, Partial<Record<State, State>>> = {
  submit: { draft: "in-review", "changes-requested": "in-review" },
  baseline: { "in-review": "baselined" },
  "request-changes": { "in-review": "changes-requested" },
  edit: { draft: "draft", "in-review": "draft", baselined: "draft", "changes-requested": "draft" },
};

describe("every transition × every role", () => {
  for (const from of STATES)
    for (const action of ACTIONS)
      for (const role of ROLES) {
        const allowed = MAY[action].includes(role);
        const to = NEXT[action][from];
        const expected = !allowed ? 403 : to ? (action === "edit" ? 201 : 200) : 409;
        it(`${from} · ${action} · ${role} → ${expected}${expected < 300 ? ` (${to})` : ""}`, async () => {
          const id = await missionIn(from);
          const before = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions`);
          const r = await act(team[role], id, action);
          // An edit answers as the workspace's save does (200 or 201); everything else as the table says.
          if (action === "edit" && allowed) expect([200, 201]).toContain(r.status);
          else expect(r.status).toBe(expected);
          if (expected === 403) expect(r.body.error.code).toBe("forbidden");
          if (expected === 409) expect(r.body.error.code).toBe("invalid-transition");
          expect(await state(id)).toBe(allowed && to ? to : from);
          const after = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions`);
          if (action === "edit" && allowed) {
            // A new draft revision; the earlier one is unchanged, except that a review in progress is withdrawn.
            expect(after.body.revisions?.length ?? after.body.length).toBe(
              (before.body.revisions?.length ?? before.body.length) + 1,
            );
          }
        });
      }
});

describe("the mission's status is its latest revision's", () => {
  it("GET of a mission answers the status of its newest revision in every review state", async () => {
    for (const state of ["in-review", "baselined"] as const) {
      const id = await missionIn(state);
      const n = await latestNumber(id);
      const rev = await call(team.viewer, "GET", `/api/v1/missions/${id}/revisions/${n}`);
      const m = await call(team.viewer, "GET", `/api/v1/missions/${id}`);
      expect(m.status).toBe(200);
      expect(rev.body.status).toBe(state);
      expect(m.body.status).toBe(rev.body.status);
    }
  });
});

describe("a baselined revision is never modified", () => {
  it("an edit after a baseline stores a new draft revision and leaves the baseline exactly as approved", async () => {
    const id = await missionIn("baselined");
    const n = await latestNumber(id);
    const base = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions/${n}`);
    expect(base.body.status).toBe("baselined");
    const e = await act(team.engineer, id, "edit");
    expect([200, 201]).toContain(e.status);
    const again = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions/${n}`);
    expect(again.body).toEqual(base.body);
    const next = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions/${n + 1}`);
    expect(next.body.status).toBe("draft");
    expect(next.body.plan.settings.guardMHz).toBe(base.body.plan.settings.guardMHz + 1);
    const ov = await call(team.viewer, "GET", R(id));
    expect(ov.body).toMatchObject({ state: "draft", baselineRevision: n });
  });

  it("an edit during a review withdraws it: the submitted revision goes back to draft", async () => {
    const id = await missionIn("in-review");
    const n = await latestNumber(id);
    await act(team.engineer, id, "edit");
    const r1 = await call(team.owner, "GET", `/api/v1/missions/${id}/revisions/${n}`);
    expect(r1.body.status).toBe("draft");
    const ov = await call(team.owner, "GET", R(id));
    expect(ov.body.reviews[0]).toMatchObject({ revision: n, outcome: "withdrawn" });
    expect((await call(team.lead, "POST", `${R(id)}/decide`, { decision: "baseline" })).status).toBe(409);
  });
});

describe("waivers: no baseline with an unwaived open error", () => {
  let id = "";
  let errors: { id: string; key: string }[] = [];
  beforeAll(async () => {
    id = await missionWithPlan(team.engineer, validPlanInput());
    errors = (await call(team.viewer, "GET", R(id))).body.errors;
  });

  it("the plan has open errors, and baselining is refused until each has a waiver", async () => {
    expect(errors.length).toBe(4);
    expect((await call(team.engineer, "POST", `${R(id)}/submit`, {})).status).toBe(200);
    const refused = await call(team.lead, "POST", `${R(id)}/decide`, { decision: "baseline" });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe("unwaived-errors");
    expect(refused.body.error.unwaived.sort()).toEqual(errors.map((e) => e.key).sort());
  });

  it("only leads and owners record waivers; engineers and viewers get 403; outsiders 404; signed out 401", async () => {
    const body = { findingId: errors[0]!.id, reason: "accepted for the breadboard" };
    expect((await call(team.engineer, "POST", `${R(id)}/waivers`, body)).status).toBe(403);
    expect((await call(team.viewer, "POST", `${R(id)}/waivers`, body)).status).toBe(403);
    expect((await call(signedOut, "POST", `${R(id)}/waivers`, body)).status).toBe(401);
    // An owner of another team: the mission does not exist for them.
    expect((await call(outsider, "POST", `${R(id)}/waivers`, body)).status).toBe(404);
  });

  it("bad waiver input names the field", async () => {
    const short = await call(team.lead, "POST", `${R(id)}/waivers`, { findingId: errors[0]!.id, reason: "" });
    expect(short.status).toBe(400);
    expect(short.body.error.issues.map((i: { path: string }) => i.path)).toEqual(["reason"]);
    const bad = await call(team.lead, "POST", `${R(id)}/waivers`, { findingId: "nope", reason: "fine", extra: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["", "findingId"].sort());
    const json = await callRaw(team.lead, "POST", `${R(id)}/waivers`, "{not json");
    expect(json.status).toBe(400);
    // A warning finding needs no waiver.
    const { rows } = await testPool().query(
      `select f.id from findings f join plan_revisions r on r.id = f.revision_id where r.mission_id = $1 and f.severity = 'warning' limit 1`,
      [id],
    );
    const warn = await call(team.lead, "POST", `${R(id)}/waivers`, { findingId: rows[0].id, reason: "not needed" });
    expect(warn.status).toBe(400);
    expect(warn.body.error.issues[0].path).toBe("findingId");
  });

  it("with all but one waived the baseline is still refused; with all waived it succeeds and records the waivers", async () => {
    const made = [];
    for (const e of errors.slice(0, -1)) {
      const w = await call(team.lead, "POST", `${R(id)}/waivers`, { findingId: e.id, reason: `accepted: ${e.key}` });
      expect(w.status).toBe(201);
      made.push(w.body);
    }
    const dup = await call(team.owner, "POST", `${R(id)}/waivers`, { findingId: errors[0]!.id, reason: "again" });
    expect([dup.status, dup.body.error.code]).toEqual([409, "already-waived"]);
    const still = await call(team.owner, "POST", `${R(id)}/decide`, { decision: "baseline" });
    expect(still.status).toBe(409);
    expect(still.body.error.unwaived).toEqual([errors.at(-1)!.key]);
    // change one reason (optimistic version), then a stale change is refused
    const upd = await call(team.owner, "PATCH", `${R(id)}/waivers/${made[0].id}`, {
      reason: "accepted after analysis",
      version: made[0].version,
    });
    expect(upd.status).toBe(200);
    const stale = await call(team.owner, "PATCH", `${R(id)}/waivers/${made[0].id}`, {
      reason: "x y z",
      version: made[0].version,
    });
    expect(stale.status).toBe(409);
    const last = await call(team.owner, "POST", `${R(id)}/waivers`, {
      findingId: errors.at(-1)!.id,
      reason: "accepted for the demo",
    });
    expect(last.status).toBe(201);
    const ok = await call(team.owner, "POST", `${R(id)}/decide`, { decision: "baseline", note: "ready to order" });
    expect(ok.status).toBe(200);
    expect(ok.body.state).toBe("baselined");
    const ov = await call(team.viewer, "GET", R(id));
    expect(ov.body.reviews[0].waivers).toHaveLength(4);
    expect(ov.body.reviews[0]).toMatchObject({ outcome: "baselined", decidedBy: team.owner.name });
    // withdrawing a waiver later keeps the record and does not touch the baseline
    const wd = await call(team.lead, "DELETE", `${R(id)}/waivers/${last.body.id}`);
    expect(wd.status).toBe(200);
    expect(wd.body.active).toBe(false);
    expect((await call(team.lead, "DELETE", `${R(id)}/waivers/${last.body.id}`)).status).toBe(409);
    expect((await call(team.lead, "DELETE", `${R(id)}/waivers/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await call(team.viewer, "GET", `${R(id)}/waivers`)).body.waivers).toHaveLength(4);
    expect((await call(team.viewer, "GET", R(id))).body.state).toBe("baselined");
  });
});

describe("requests and errors", () => {
  it("401 signed out, 404 for another team's mission and for malformed ids, 400 for bad bodies, 409 for a stale revision", async () => {
    const id = await missionIn("draft");
    expect((await call(signedOut, "POST", `${R(id)}/submit`, {})).status).toBe(401);
    expect((await call(signedOut, "GET", R(id))).status).toBe(401);
    expect((await call(outsider, "GET", R(id))).status).toBe(404);
    expect((await call(outsider, "POST", `${R(id)}/submit`, {})).status).toBe(404);
    expect((await call(team.owner, "GET", R("not-a-uuid"))).status).toBe(404);
    const bad = await call(team.owner, "POST", `${R(id)}/submit`, { revision: "one", whatever: true });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["", "revision"]);
    expect((await callRaw(team.owner, "POST", `${R(id)}/submit`, "{")).status).toBe(400);
    const n = await latestNumber(id);
    const stale = await call(team.owner, "POST", `${R(id)}/submit`, { revision: n + 5 });
    expect([stale.status, stale.body.error.code]).toEqual([409, "stale-revision"]);
    expect((await call(team.owner, "POST", `${R(id)}/submit`, { revision: n })).status).toBe(200);
    const noNote = await call(team.lead, "POST", `${R(id)}/decide`, { decision: "request-changes" });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.issues[0].path).toBe("note");
    const what = await call(team.lead, "POST", `${R(id)}/decide`, { decision: "approve" });
    expect([what.status, what.body.error.issues[0].path]).toEqual([400, "decision"]);
  });
});

describe("e-mail", () => {
  it("submitting mails the team's leads and owners (not the engineer or viewer); deciding mails the author", async () => {
    const name = unique("Mail test mission");
    const id = await missionWithPlan(team.engineer, cleanPlan(name));
    const since = new Date();
    const s = await call(team.engineer, "POST", `${R(id)}/submit`, { note: "first look" });
    expect(s.status).toBe(200);
    expect(s.body.notified.sort()).toEqual([team.owner.email, team.lead.email].sort());
    const toLead = await readMail(team.lead.email, `submitted for review: ${name}`);
    expect(toLead.text).toContain(`/missions/${id}`);
    expect(toLead.text).toContain("first look");
    await readMail(team.owner.email, `submitted for review: ${name}`);
    const { rows } = await testPool().query(
      `select recipients from captured_mail where subject ilike $1 and received_at >= $2`,
      [`Submitted for review: ${name}%`, since],
    );
    const all = rows.flatMap((r: { recipients: string[] }) => r.recipients);
    expect(all).not.toContain(team.engineer.email);
    expect(all).not.toContain(team.viewer.email);
    const d = await call(team.lead, "POST", `${R(id)}/decide`, {
      decision: "request-changes",
      note: "widen the guard",
    });
    expect(d.body.notified).toEqual([team.engineer.email]);
    const back = await readMail(team.engineer.email, `returned for rework: ${name}`);
    expect(back.text).toContain("widen the guard");
  });

  it("preferences are respected: a lead who turned review requests off gets none", async () => {
    await testPool().query(
      `insert into notification_preferences (user_id, review_requested, review_decided, mentioned) values ($1, false, true, true)
       on conflict (user_id) do update set review_requested = false`,
      [team.lead.userId],
    );
    try {
      const name = unique("Prefs test mission");
      const id = await missionWithPlan(team.engineer, cleanPlan(name));
      const s = await call(team.engineer, "POST", `${R(id)}/submit`, {});
      expect(s.body.notified).toEqual([team.owner.email]);
      await readMail(team.owner.email, `submitted for review: ${name}`);
      await expect(readMail(team.lead.email, `submitted for review: ${name}`, 1500)).rejects.toThrow(/no mail/);
    } finally {
      await testPool().query(`delete from notification_preferences where user_id = $1`, [team.lead.userId]);
    }
  });
});

describe("comments and @mentions", () => {
  it("comments on a revision, a channel and a finding; mentions by e-mail and by name are mailed", async () => {
    const name = unique("Comment test mission");
    const id = await missionWithPlan(team.engineer, { ...validPlanInput(), name });
    const ov = await call(team.viewer, "GET", R(id));
    const finding = ov.body.errors[0];
    const c1 = await call(team.engineer, "POST", `${R(id)}/comments`, {
      body: `@${team.lead.email} can you check the slot overlap?`,
    });
    expect(c1.status).toBe(201);
    expect(c1.body.notified).toEqual([team.lead.email]);
    const m1 = await readMail(team.lead.email, `mentioned you on ${name}`);
    expect(m1.text).toContain("can you check the slot overlap?");
    const c2 = await call(team.lead, "POST", `${R(id)}/comments`, {
      body: `Looks fine, @${team.viewer.name}.`,
      channelKey: "wv1",
    });
    expect([c2.status, c2.body.channelKey, c2.body.notified]).toEqual([201, "wv1", [team.viewer.email]]);
    await readMail(team.viewer.email, `mentioned you on ${name}`);
    const c3 = await call(team.owner, "POST", `${R(id)}/comments`, {
      body: "Known issue.",
      findingId: finding.id,
      revision: ov.body.revision.number,
    });
    expect([c3.status, c3.body.findingId]).toEqual([201, finding.id]);
    const list = await call(team.viewer, "GET", `${R(id)}/comments`);
    expect(list.body.comments.map((c: { body: string }) => c.body)).toEqual([c1.body.body, c2.body.body, c3.body.body]);
    const byChannel = await call(team.viewer, "GET", `${R(id)}/comments?channel=wv1`);
    expect(byChannel.body.comments).toHaveLength(1);
    expect((await call(team.viewer, "GET", `${R(id)}/comments?revision=zero`)).status).toBe(400);
  }, 120_000);

  it("viewers may not comment; bad targets name the field", async () => {
    const id = await missionWithPlan(team.engineer, cleanPlan());
    expect((await call(team.viewer, "POST", `${R(id)}/comments`, { body: "hello" })).status).toBe(403);
    const ch = await call(team.engineer, "POST", `${R(id)}/comments`, { body: "x", channelKey: "nope" });
    expect([ch.status, ch.body.error.issues[0].path]).toEqual([400, "channelKey"]);
    const rv = await call(team.engineer, "POST", `${R(id)}/comments`, { body: "x", revision: 99 });
    expect([rv.status, rv.body.error.issues[0].path]).toEqual([400, "revision"]);
    const empty = await call(team.engineer, "POST", `${R(id)}/comments`, { body: "   " });
    expect([empty.status, empty.body.error.issues[0].path]).toEqual([400, "body"]);
  });
});

describe("compare", () => {
  it("field-level differences and findings between two revisions; 400 and 404 for bad queries", async () => {
    const id = await missionWithPlan(team.engineer, cleanPlan());
    const n = await latestNumber(id);
    await act(team.engineer, id, "edit");
    const c = await call(team.viewer, "GET", `/api/v1/missions/${id}/compare?from=${n}&to=${n + 1}`);
    expect(c.status).toBe(200);
    expect(c.body.entities).toHaveLength(1);
    expect(c.body.entities[0]).toMatchObject({ section: "settings", kind: "changed" });
    expect(c.body.entities[0].fields[0].path).toBe("guardMHz");
    expect(c.body.entities[0].fields[0].after - c.body.entities[0].fields[0].before).toBe(1);
    const same = await call(team.viewer, "GET", `/api/v1/missions/${id}/compare?from=${n + 1}&to=${n + 1}`);
    expect(same.body.entities).toEqual([]);
    expect(same.body.findings.new).toEqual([]);
    const missing = await call(team.viewer, "GET", `/api/v1/missions/${id}/compare?from=${n}`);
    expect([missing.status, missing.body.error.issues[0].path]).toEqual([400, "to"]);
    expect((await call(team.viewer, "GET", `/api/v1/missions/${id}/compare?from=${n}&to=${n + 50}`)).status).toBe(404);
    expect((await call(outsider, "GET", `/api/v1/missions/${id}/compare?from=${n}&to=${n + 1}`)).status).toBe(404);
  });
});

describe("audit trail CSV", () => {
  it("exports the review actions with filters; viewers may not export; bad filters are 400", async () => {
    const id = await missionIn("baselined");
    const res = await team.owner.fetch(`/api/v1/audit.csv?mission=${id}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    const text = await res.text();
    const lines = text.trim().split("\r\n");
    expect(lines[0]).toBe(
      "at_utc,person,person_id,mission,mission_id,action,entity,summary,revision_before,revision_after",
    );
    expect(lines.some((l) => l.includes(",review-submit,"))).toBe(true);
    expect(lines.some((l) => l.includes(",review-baseline,"))).toBe(true);
    expect(lines.slice(1).every((l) => l.includes(id))).toBe(true);
    const only = await (await team.owner.fetch(`/api/v1/audit.csv?mission=${id}&action=review-baseline`)).text();
    expect(only.trim().split("\r\n")).toHaveLength(2);
    const today = new Date().toISOString().slice(0, 10);
    const none = await (await team.owner.fetch(`/api/v1/audit.csv?mission=${id}&to=2000-01-01`)).text();
    expect(none.trim().split("\r\n")).toHaveLength(1);
    const some = await (await team.owner.fetch(`/api/v1/audit.csv?mission=${id}&from=${today}&to=${today}`)).text();
    expect(some.trim().split("\r\n").length).toBe(lines.length);
    expect((await team.viewer.fetch(`/api/v1/audit.csv`)).status).toBe(403);
    expect((await signedOut.fetch(`/api/v1/audit.csv`)).status).toBe(401);
    const bad = await call(team.owner, "GET", `/api/v1/audit.csv?from=2026-13-45`);
    expect([bad.status, bad.body.error.issues[0].path]).toEqual([400, "from"]);
    // Another team sees none of these rows.
    const theirs = await (await outsider.fetch(`/api/v1/audit.csv?mission=${id}`)).text();
    expect(theirs.trim().split("\r\n")).toHaveLength(1);
  });
});
