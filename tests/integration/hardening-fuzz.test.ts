/**
 * Issue 17: a fuzz test of malformed documents across the mutation routes.
 * Each document is a valid request body with at least one change that
 * makes it invalid for sure — a value of the wrong JSON type anywhere in
 * it, a control character in a text, an integer beyond its column, a
 * missing required field, an unknown field in a strict object, another
 * top-level value, malformed JSON, bytes that are not UTF-8 — and every
 * answer must be 400 with issues that each name a path; never a 5xx, and
 * nothing is saved. Bounded: a fixed number of documents per route (at
 * least 3 000 in all; the count is printed), one seed (ADR 020).
 */
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestPool, makeTeamWithRoles, testPool, type TeamWithRoles } from "../setup/auth-helpers";
import { chainBody, channelBody, detectorBody, laserBody, resonatorBody } from "../setup/workspace-bodies";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

const RUNS_PER_ROUTE = 125;
const FAKE = "00000000-0000-4000-8000-000000000000";

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
interface FuzzRoute {
  name: string;
  method: string;
  path: () => string;
  base: () => Json;
  /** Required top-level fields (deleting one is an error). */
  required: string[];
  /** Paths of whole numbers stored in integer columns (2³¹ is an error). */
  ints?: (string | number)[][];
  /** Unknown fields are refused (strict objects). */
  strict: boolean;
  /** Control characters in text are refused (not for the check endpoint: it stores nothing). */
  text: boolean;
}

let t: TeamWithRoles;
let missionId = "";
const ids: Record<string, string> = {};
const M = () => `/api/v1/missions/${missionId}`;

beforeAll(async () => {
  t = await makeTeamWithRoles();
  missionId = await missionWithPlan(t.owner, validPlanInput());
  for (const k of ["lasers", "resonators", "detectors", "chains", "channels"])
    ids[k] = (await call(t.owner, "GET", `${M()}/${k}`)).body[k][0].id;
  const team = (await call(t.owner, "GET", "/api/team")).body;
  ids.member = team.members.find((m: { email: string }) => m.email === t.viewer.email).id;
}, 240_000);
afterAll(closeTestPool);

const ROUTES: FuzzRoute[] = [
  {
    name: "create mission",
    method: "POST",
    path: () => "/api/v1/missions",
    base: () => ({ name: "Fuzz", description: "d" }),
    required: ["name"],
    strict: true,
    text: true,
  },
  {
    name: "update mission",
    method: "PATCH",
    path: M,
    base: () => ({ name: "Fuzz", description: "d", version: 1 }),
    required: ["version"],
    ints: [["version"]],
    strict: true,
    text: true,
  },
  {
    name: "settings",
    method: "PUT",
    path: () => `${M()}/settings`,
    base: () => ({ guardMHz: 50, imageRejectionDB: 25, spurMaxOrder: 5, replicaLimitDB: -20, version: 1 }),
    required: ["guardMHz", "imageRejectionDB", "spurMaxOrder", "replicaLimitDB", "version"],
    ints: [["version"]],
    strict: true,
    text: true,
  },
  {
    name: "create laser",
    method: "POST",
    path: () => `${M()}/lasers`,
    base: () => laserBody("Lf"),
    required: ["key", "carrierTHz", "reach", "lock"],
    ints: [["lock", "orders"]],
    strict: true,
    text: true,
  },
  {
    name: "create resonator",
    method: "POST",
    path: () => `${M()}/resonators`,
    base: () => resonatorBody("Rf"),
    required: ["key", "fsrGHz", "loadedQ"],
    strict: true,
    text: true,
  },
  {
    name: "create detector",
    method: "POST",
    path: () => `${M()}/detectors`,
    base: () => detectorBody("Df"),
    required: ["key", "minGHz", "maxGHz"],
    strict: true,
    text: true,
  },
  {
    name: "create chain",
    method: "POST",
    path: () => `${M()}/chains`,
    base: () => chainBody({ laserId: ids.lasers!, resonatorId: ids.resonators!, detectorId: ids.detectors! }, "Cf"),
    required: ["key", "laserId", "mode", "rfInput"],
    ints: [["mode"]],
    strict: true,
    text: true,
  },
  {
    name: "create channel",
    method: "POST",
    path: () => `${M()}/channels`,
    base: () => channelBody(ids.chains!, "chf"),
    required: ["key", "name", "chainId", "centerGHz"],
    strict: true,
    text: true,
  },
  {
    name: "update laser",
    method: "PATCH",
    path: () => `${M()}/lasers/${ids.lasers}`,
    base: () => ({ stepMHz: 5, lock: { modulationMHz: 60, modulationIndex: 0.5, orders: 2 }, version: 1 }),
    required: ["version"],
    ints: [["version"], ["lock", "orders"]],
    strict: true,
    text: true,
  },
  {
    name: "update chain",
    method: "PATCH",
    path: () => `${M()}/chains/${ids.chains}`,
    base: () => ({ mode: 2, sideband: "upper", version: 1 }),
    required: ["version"],
    ints: [["version"], ["mode"]],
    strict: true,
    text: true,
  },
  {
    name: "update channel",
    method: "PATCH",
    path: () => `${M()}/channels/${ids.channels}`,
    base: () => ({ name: "renamed", bandwidthMHz: 12, version: 1 }),
    required: ["version"],
    ints: [["version"]],
    strict: true,
    text: true,
  },
  {
    name: "import plan",
    method: "POST",
    path: () => `${M()}/plan`,
    base: () => validPlanInput() as unknown as Json,
    required: ["format", "name", "settings", "lasers", "chains", "channels"],
    ints: [
      ["chains", 0, "mode"],
      ["lasers", 1, "lock", "orders"],
    ],
    strict: true,
    text: true,
  },
  {
    name: "check plan",
    method: "POST",
    path: () => "/api/v1/check",
    base: () => validPlanInput() as unknown as Json,
    required: ["format", "name", "settings", "lasers"],
    strict: true,
    text: false,
  },
  {
    name: "comment",
    method: "POST",
    path: () => `${M()}/review/comments`,
    base: () => ({ body: "hello @nobody", revision: 1, channelKey: "wv1" }),
    required: ["body"],
    ints: [["revision"]],
    strict: true,
    text: true,
  },
  {
    name: "waiver",
    method: "POST",
    path: () => `${M()}/review/waivers`,
    base: () => ({ findingId: FAKE, reason: "accepted for now" }),
    required: ["findingId", "reason"],
    strict: true,
    text: true,
  },
  {
    name: "update waiver",
    method: "PATCH",
    path: () => `${M()}/review/waivers/${FAKE}`,
    base: () => ({ reason: "still accepted", version: 1 }),
    required: ["reason", "version"],
    ints: [["version"]],
    strict: true,
    text: true,
  },
  {
    name: "submit review",
    method: "POST",
    path: () => `${M()}/review/submit`,
    base: () => ({ note: "please look", revision: 1 }),
    required: [],
    ints: [["revision"]],
    strict: true,
    text: true,
  },
  {
    name: "decide review",
    method: "POST",
    path: () => `${M()}/review/decide`,
    base: () => ({ decision: "request-changes", note: "fix it", revision: 1 }),
    required: ["decision"],
    ints: [["revision"]],
    strict: true,
    text: true,
  },
  {
    name: "invite",
    method: "POST",
    path: () => "/api/team/invitations",
    base: () => ({ email: "fuzz@test.heterolane.local", role: "viewer" }),
    required: ["email", "role"],
    strict: false,
    text: true,
  },
  {
    name: "change role",
    method: "PATCH",
    path: () => `/api/team/members/${ids.member}`,
    base: () => ({ role: "engineer" }),
    required: ["role"],
    strict: false,
    text: true,
  },
  {
    name: "create API token",
    method: "POST",
    path: () => "/api/account/tokens",
    base: () => ({ name: "fuzz token", teamId: t.teamId, role: "viewer", expiresInDays: 30, requestsPerMinute: 60 }),
    required: ["name", "teamId", "role"],
    ints: [],
    strict: true,
    text: true,
  },
  {
    name: "create mission (again, other seed stream)",
    method: "POST",
    path: () => "/api/v1/missions",
    base: () => ({ name: "Fuzz 2" }),
    required: ["name"],
    strict: true,
    text: true,
  },
  {
    name: "create channel (again)",
    method: "POST",
    path: () => `${M()}/channels`,
    base: () => ({ ...channelBody(ids.chains!, "chg"), dsbOffsetGHz: 7, gainStability: 0.001 }),
    required: ["key", "name"],
    strict: true,
    text: true,
  },
  {
    name: "import plan (again)",
    method: "POST",
    path: () => `${M()}/plan`,
    base: () => validPlanInput() as unknown as Json,
    required: ["settings", "resonators", "detectors"],
    ints: [["chains", 1, "mode"]],
    strict: true,
    text: true,
  },
  {
    name: "comment (again)",
    method: "POST",
    path: () => `${M()}/review/comments`,
    base: () => ({ body: "line one\nline two" }),
    required: ["body"],
    strict: true,
    text: true,
  },
  {
    name: "settings (again)",
    method: "PUT",
    path: () => `${M()}/settings`,
    base: () => ({ guardMHz: 0, imageRejectionDB: 0, spurMaxOrder: 9, replicaLimitDB: 0, version: 3 }),
    required: ["spurMaxOrder"],
    ints: [["spurMaxOrder"]],
    strict: true,
    text: true,
  },
];

type Path = (string | number)[];
function pathsOf(v: Json, at: Path = []): Path[] {
  const here = at.length ? [at] : [];
  if (Array.isArray(v)) return [...here, ...v.flatMap((x, i) => pathsOf(x, [...at, i]))];
  if (v && typeof v === "object") return [...here, ...Object.entries(v).flatMap(([k, x]) => pathsOf(x, [...at, k]))];
  return here;
}
function getAt(v: Json, p: Path): Json {
  return p.reduce<Json>((o, k) => (o as Record<string | number, Json>)[k]!, v);
}
function setAt(v: Json, p: Path, value: Json | undefined): void {
  const parent = getAt(v, p.slice(0, -1)) as Record<string | number, Json>;
  if (value === undefined) delete parent[p[p.length - 1]!];
  else parent[p[p.length - 1]!] = value;
}

/** Values of another JSON type than `v` that no field of its type accepts (never null: some fields are nullable). */
function wrongTypes(v: Json): Json[] {
  if (typeof v === "string") return [42, true, {}, [], ["x"], -0.5];
  if (typeof v === "number") return ["1", true, {}, [1], "NaN", ""];
  if (typeof v === "boolean") return ["true", 1, {}, [], 0];
  if (Array.isArray(v)) return [{}, "x", 1, true, { length: 1 }];
  return [[], "x", 1, false, [{}]];
}

/** A malformed request body for `route`: its text (or bytes) and what was done. */
type Doc = { body: string | Uint8Array; what: string };
function malformed(route: FuzzRoute): fc.Arbitrary<Doc> {
  const base = route.base();
  const leaves = pathsOf(base);
  const strings = leaves.filter((p) => typeof getAt(base, p) === "string");
  const objects: Path[] = [
    [],
    ...leaves.filter((p) => {
      const x = getAt(base, p);
      return !!x && typeof x === "object" && !Array.isArray(x);
    }),
  ];
  const json = (edit: (d: Json) => string) => {
    const d = structuredClone(base);
    return edit(d);
  };
  const kinds: fc.Arbitrary<Doc>[] = [
    fc.tuple(fc.nat(leaves.length - 1), fc.nat(20)).map(([i, j]) => {
      const p = leaves[i]!;
      const options = wrongTypes(getAt(base, p));
      const value = options[j % options.length]!;
      return {
        body: json((d) => (setAt(d, p, value), JSON.stringify(d))),
        what: `wrong type at ${p.join(".")}: ${JSON.stringify(value)}`,
      };
    }),
    fc
      .constantFrom<Json>([], "text", 7, null, true, [{}])
      .map((v) => ({ body: JSON.stringify(v), what: `top-level ${JSON.stringify(v)}` })),
    fc.nat(1_000_000).map((n) => {
      const text = JSON.stringify(base);
      const cut = 1 + (n % Math.max(1, text.length - 1));
      return { body: text.slice(0, cut), what: `cut after ${cut} characters` };
    }),
    fc
      .constantFrom("{", "{'a':1}", '{"a":}', "nul", "[1,]", '{"a":1}}', "\u0000", "")
      .map((s) => ({ body: s, what: `malformed ${JSON.stringify(s)}` })),
    fc.nat(1000).map((n) => {
      const text = Buffer.from(JSON.stringify(base));
      const at = text.indexOf(Buffer.from('"')) + 1 + (n % 2);
      return {
        body: Buffer.concat([text.subarray(0, at), Buffer.from([0xc3, 0x28, 0xff]), text.subarray(at)]),
        what: "invalid UTF-8 inside a string",
      };
    }),
    fc.nat(1000).map((n) => ({
      body: json((d) => {
        let deep: Json = 1;
        for (let i = 0; i < 100 + (n % 100); i++) deep = [deep];
        const p = leaves[n % leaves.length]!;
        setAt(d, p, typeof getAt(base, p) === "object" && Array.isArray(getAt(base, p)) ? { deep } : deep);
        return JSON.stringify(d);
      }),
      what: "deeply nested value",
    })),
  ];
  if (route.required.length)
    kinds.push(
      fc
        .constantFrom(...route.required)
        .map((k) => ({ body: json((d) => (setAt(d, [k], undefined), JSON.stringify(d))), what: `without ${k}` })),
    );
  if (route.strict)
    kinds.push(
      fc.tuple(fc.nat(objects.length - 1), fc.constantFrom("extra", "__proto_x", "Name", "version2")).map(([i, k]) => ({
        body: json((d) => (((getAt(d, objects[i]!) as Record<string, Json>)[k] = 1), JSON.stringify(d))),
        what: `unknown field ${k} at ${objects[i]!.join(".")}`,
      })),
    );
  if (route.text && strings.length)
    kinds.push(
      fc
        .tuple(fc.nat(strings.length - 1), fc.constantFrom("\u0000", "\u001b", "\u0007", "\ud800", "\u0085"))
        .map(([i, c]) => ({
          body: json((d) => (setAt(d, strings[i]!, `x${c}y`), JSON.stringify(d))),
          what: `control character U+${c.charCodeAt(0).toString(16)} at ${strings[i]!.join(".")}`,
        })),
    );
  if (route.ints?.length)
    kinds.push(
      fc.tuple(fc.constantFrom(...route.ints), fc.nat(2 ** 20)).map(([p, k]) => ({
        body: json((d) => (setAt(d, p, 2 ** 31 + k), JSON.stringify(d))),
        what: `integer 2^31+${k} at ${p.join(".")}`,
      })),
    );
  return fc.oneof(...kinds);
}

describe("fuzz: malformed documents across the mutation routes", () => {
  it(`${ROUTES.length} routes × ${RUNS_PER_ROUTE} documents: each 400 with issues naming a path, never 5xx, nothing saved`, async () => {
    const revisionsBefore = (
      await testPool().query(`select count(*)::int as n from plan_revisions where mission_id = $1`, [missionId])
    ).rows[0].n;
    const statuses = new Map<number, number>();
    let sent = 0;
    for (const route of ROUTES) {
      await fc.assert(
        fc.asyncProperty(malformed(route), async (doc) => {
          const res = await t.owner.fetch(route.path(), {
            method: route.method,
            headers: { "content-type": "application/json" },
            body: typeof doc.body === "string" ? doc.body : new Uint8Array(doc.body),
          });
          sent++;
          statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
          const text = await res.text();
          const where = `${route.name}: ${doc.what} → ${res.status} ${text.slice(0, 200)}`;
          expect(res.status, where).toBe(400);
          const issues = JSON.parse(text).error?.issues;
          expect(Array.isArray(issues) && issues.length > 0, where).toBe(true);
          for (const i of issues) expect(typeof i.path === "string" && typeof i.message === "string", where).toBe(true);
        }),
        { numRuns: RUNS_PER_ROUTE },
      );
    }
    console.log(
      `[fuzz] ${sent} malformed documents across ${ROUTES.length} route cases: ` +
        [...statuses].map(([s, n]) => `${s} × ${n}`).join(", "),
    );
    expect(sent).toBeGreaterThanOrEqual(3000);
    expect([...statuses.keys()].some((s) => s >= 500)).toBe(false);
    const revisionsAfter = (
      await testPool().query(`select count(*)::int as n from plan_revisions where mission_id = $1`, [missionId])
    ).rows[0].n;
    expect(revisionsAfter).toBe(revisionsBefore);
  }, 600_000);
});
