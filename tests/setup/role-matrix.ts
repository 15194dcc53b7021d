/**
 * The role matrix shared by the route × role integration tests: the roles,
 * one mission with a row of every kind to act on, the table of mutation
 * routes (each case builds its own request, creating rows as the owner
 * first), and the runner that sends every case as every role and expects the
 * allowed roles to succeed, the rest 403, signed-out callers 401 and another
 * team 404 for the mission's routes.
 */
import { expect, it } from "vitest";
import type { TestClient } from "./auth-helpers";
import { call, missionWithPlan, upload, type Reply } from "./workspace-helpers";
import {
  CHANNELS_CSV_HEADER,
  chainBody,
  channelBody,
  DETECTOR_CSV,
  detectorBody,
  laserBody,
  resonatorBody,
  TUNING_CSV,
  uniqueKey,
} from "./workspace-bodies";
import { validPlanInput } from "../fixtures/valid-plan";

export type Role = "owner" | "lead" | "engineer" | "viewer";
export const ROLES: Role[] = ["owner", "lead", "engineer", "viewer"];
export const EDIT: Role[] = ["owner", "lead", "engineer"];
export const DECIDE: Role[] = ["owner", "lead"];
export const KINDS = ["lasers", "resonators", "detectors", "chains", "channels"] as const;
export type Kind = (typeof KINDS)[number];

export interface RoleRequest {
  method: string;
  path: string;
  json?: unknown;
  file?: string;
}

export interface RoleCase {
  name: string;
  /** Roles that may act; the rest get 403. */
  allowed: Role[];
  ok: number;
  /** Builds the request (may create rows as the owner first). */
  prepare: () => Promise<RoleRequest>;
  /** Mission-scoped: another team's caller gets 404. */
  scoped?: boolean;
}

/** Sends a prepared request: a multipart upload when it carries a file, JSON otherwise. */
export function sendRequest(c: TestClient, req: RoleRequest): Promise<Reply> {
  return req.file !== undefined ? upload(c, req.path, req.file) : call(c, req.method, req.path, req.json);
}

/** The owner's mission the matrix acts on (imported from the valid plan) and the id of its first row of each kind. */
export class RoleMission {
  missionId = "";
  readonly ids: Partial<Record<Kind, string>> = {};
  private owner: TestClient | undefined;

  /** The mission's API path. */
  readonly path = () => `/api/v1/missions/${this.missionId}`;

  async setUp(owner: TestClient): Promise<void> {
    this.owner = owner;
    this.missionId = await missionWithPlan(owner, validPlanInput());
    for (const k of KINDS) {
      const r = await call(owner, "GET", `${this.path()}/${k}`);
      this.ids[k] = r.body[k][0].id;
    }
  }

  get by(): TestClient {
    if (!this.owner) throw new Error("RoleMission.setUp has not run");
    return this.owner;
  }

  /** The create body of a kind; a chain gets a fresh laser of its own. */
  async body(kind: Kind): Promise<unknown> {
    if (kind === "lasers") return laserBody();
    if (kind === "resonators") return resonatorBody();
    if (kind === "detectors") return detectorBody();
    if (kind === "chains") {
      const laser = await this.fresh("lasers");
      return chainBody({ laserId: laser.id, resonatorId: this.ids.resonators!, detectorId: this.ids.detectors! });
    }
    return channelBody(this.ids.chains!);
  }

  /** The owner makes a fresh, unreferenced row of a kind (so any role's delete or update can succeed). */
  async fresh(kind: Kind): Promise<{ id: string; version: number }> {
    const r = await call(this.by, "POST", `${this.path()}/${kind}`, await this.body(kind));
    if (r.status !== 201) throw new Error(`fresh ${kind}: ${r.status} ${r.text}`);
    return { id: r.body.id, version: r.body.version };
  }
}

/** A change to each kind that its update route accepts. */
const CHANGE: Record<Kind, Record<string, unknown>> = {
  lasers: { driftMHz: 15 },
  resonators: { loadedQ: 2e7 },
  detectors: { maxGHz: 6.5 },
  chains: { pathLossDB: 2 },
  channels: { integrationMs: 20 },
};

/** The workspace's mutation routes: missions, every entity kind, settings, plan import and the three upload previews. */
export function workspaceMutationCases(m: RoleMission, missionLabel: string): RoleCase[] {
  const M = m.path;
  return [
    {
      name: "POST missions",
      allowed: EDIT,
      ok: 201,
      scoped: false,
      prepare: async () => ({
        method: "POST",
        path: "/api/v1/missions",
        json: { name: `${missionLabel} ${uniqueKey("m")}` },
      }),
    },
    {
      name: "PATCH mission",
      allowed: EDIT,
      ok: 200,
      prepare: async () => {
        const r = await call(m.by, "GET", M());
        return { method: "PATCH", path: M(), json: { description: uniqueKey("d"), version: r.body.version } };
      },
    },
    {
      name: "DELETE mission",
      allowed: ["owner"],
      ok: 200,
      prepare: async () => {
        const other = await call(m.by, "POST", "/api/v1/missions", { name: `Doomed ${uniqueKey("m")}` });
        return { method: "DELETE", path: `/api/v1/missions/${other.body.id}?version=${other.body.version}` };
      },
    },
    ...KINDS.flatMap<RoleCase>((k) => [
      {
        name: `POST ${k}`,
        allowed: EDIT,
        ok: 201,
        prepare: async () => ({ method: "POST", path: `${M()}/${k}`, json: await m.body(k) }),
      },
      {
        name: `PATCH ${k}/{id}`,
        allowed: EDIT,
        ok: 200,
        prepare: async () => {
          const row = await m.fresh(k);
          return { method: "PATCH", path: `${M()}/${k}/${row.id}`, json: { ...CHANGE[k], version: row.version } };
        },
      },
      {
        name: `DELETE ${k}/{id}`,
        allowed: EDIT,
        ok: 200,
        prepare: async () => {
          const row = await m.fresh(k);
          return { method: "DELETE", path: `${M()}/${k}/${row.id}?version=${row.version}` };
        },
      },
    ]),
    {
      name: "PUT settings",
      allowed: EDIT,
      ok: 200,
      prepare: async () => {
        const s = await call(m.by, "GET", `${M()}/settings`);
        return {
          method: "PUT",
          path: `${M()}/settings`,
          json: { ...s.body, updatedAt: undefined, guardMHz: 40 + Math.random() },
        };
      },
    },
    {
      name: "POST plan (import)",
      allowed: EDIT,
      ok: 201,
      prepare: async () => {
        const other = await missionWithPlan(m.by, undefined);
        return { method: "POST", path: `/api/v1/missions/${other}/plan`, json: validPlanInput() };
      },
    },
    {
      name: "POST uploads/tuning-map (preview)",
      allowed: EDIT,
      ok: 200,
      prepare: async () => ({
        method: "POST",
        path: `${M()}/uploads/tuning-map?laserId=${m.ids.lasers}&gapMHz=15`,
        file: TUNING_CSV,
      }),
    },
    {
      name: "POST uploads/detector-response (preview)",
      allowed: EDIT,
      ok: 200,
      prepare: async () => ({
        method: "POST",
        path: `${M()}/uploads/detector-response?detectorId=${m.ids.detectors}&dropDB=3`,
        file: DETECTOR_CSV,
      }),
    },
    {
      name: "POST uploads/channels (preview)",
      allowed: EDIT,
      ok: 200,
      prepare: async () => ({
        method: "POST",
        path: `${M()}/uploads/channels`,
        file: `${CHANNELS_CSV_HEADER}\nx1,extra,A,183.2,10,,10,250,5000,0,\n`,
      }),
    },
  ];
}

export interface RoleMatrixOptions {
  /** The caller acting as each role of the team. */
  as: (role: Role) => TestClient;
  /** A caller of another team with every permission there: gets 404 for every mission-scoped case. */
  outsider: () => TestClient;
  /** When given, every case is also sent signed out and must get 401. */
  signedOut?: TestClient;
  /** Sends one request (defaults to `sendRequest`; a test may wrap it to check every answer). */
  send?: (c: TestClient, req: RoleRequest) => Promise<Reply>;
  /** The test's title for a case. */
  title: (c: RoleCase) => string;
  timeout?: number;
}

/** One test per case: every role gets its expected status (403 with code "forbidden" when not allowed), then signed out 401 and another team 404. */
export function roleMatrix(cases: RoleCase[], o: RoleMatrixOptions): void {
  const send = o.send ?? sendRequest;
  for (const c of cases) {
    it(
      o.title(c),
      async () => {
        for (const role of ROLES) {
          const r = await send(o.as(role), await c.prepare());
          const expected = c.allowed.includes(role) ? c.ok : 403;
          expect({ role, status: r.status, body: r.status === expected ? null : r.text }).toEqual({
            role,
            status: expected,
            body: null,
          });
          if (expected === 403) expect(r.body.error.code).toBe("forbidden");
        }
        if (o.signedOut) {
          const anon = await send(o.signedOut, await c.prepare());
          expect(anon.status).toBe(401);
        }
        if (c.scoped !== false) {
          // the outsider is the owner of their own team: every permission, still 404
          const r = await send(o.outsider(), await c.prepare());
          expect({ status: r.status, code: r.body?.error?.code }).toEqual({ status: 404, code: "not-found" });
        }
      },
      o.timeout,
    );
  }
}
