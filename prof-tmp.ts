import { parsePlan } from "@/schemas/plan";
import { checkPlan } from "@/lib/plan";
import { demoPlan } from "@db/seed/mission-demo-plan";
const d = parsePlan(demoPlan()); if (!d.ok) throw 0;
for (let i = 0; i < 200; i++) checkPlan(d.plan);
const t0 = process.cpuUsage();
for (let i = 0; i < 500; i++) checkPlan(d.plan);
const c = process.cpuUsage(t0); console.log("cpu ms per check", (c.user + c.system) / 1000 / 500);
