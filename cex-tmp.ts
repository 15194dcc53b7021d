import { parsePlan } from "@/schemas/plan";
import { readFileSync } from "node:fs";
import { buildMapModel, codesOfMask } from "@/lib/plan/internals/map-model";
import { mapPieces } from "@/lib/plan/internals/map-sweep";
import { makePointEvaluator } from "@/lib/plan/internals/map-point";
import { fullCheckCodes, interiorPoints } from "@/lib/plan/feasibility-map.test-util";
const r = parsePlan(JSON.parse(readFileSync(process.argv[2]!, "utf8"))); if (!r.ok) throw new Error(JSON.stringify(r.issues));
const m = buildMapModel(r.plan, "A");
const pieces = mapPieces(m);
const at = makePointEvaluator(m);
for (const p of pieces) console.log("piece", p.lo, p.hi, codesOfMask(p.mask));
for (const { L, piece } of interiorPoints(pieces, [0, 0.5, 1])) {
  const got = fullCheckCodes(r.plan, "A", L);
  const want = codesOfMask(piece.mask);
  if (JSON.stringify(got) !== JSON.stringify(want)) console.log("L", L, "full", got, "map", want, "lean", codesOfMask(at(L)));
}
