// Prints the weakest elements and paths of the demo plans' usual analyses (used to write docs/plan-model.md).
// Run: npx tsx bench/demo-report.ts
import { solvePlan, constructionCatalogue, demoPlans } from "../src/index.js";

const cases: Record<string, Array<[string, string, string]>> = {
  "fernhollow-studio.plan.json": [["back", "machinery-hum", "record"], ["cafe", "speech-raised", "record"], ["cafe", "speech-raised", "control"], ["outdoors", "tram-wheel-squeal", "control"], ["outdoors", "tram-wheel-squeal", "record"]],
  "cinema-under-nursery.plan.json": [["cinema", "cinema-bass", "nursery"], ["cinema", "cinema-bass", "hall"]],
};
for (const d of demoPlans()) {
  for (const [spaceId, spectrumId, receiver] of cases[d.file] ?? []) {
    const r = solvePlan(d.plan, constructionCatalogue, { source: { spaceId, spectrumId }, receiver, k: 3 });
    if (!r.ok) { console.log(r.problems); continue; }
    console.log(`${d.file}: ${spaceId} (${spectrumId}) → ${receiver}: ${r.result.dba.toFixed(1)} dB(A), NC ${r.result.nc.value}`);
    for (const e of r.onPlan.elements.slice(0, 4)) console.log(`   ${e.kind.padEnd(8)} ${e.name.padEnd(44)} share ${(e.share * 100).toFixed(1).padStart(5)} %  gain ${e.gainIfPerfectDb.toFixed(1)} dB(A)${e.gainExact ? "" : " (est.)"}`);
    for (const p of r.result.paths) console.log(`   path ${p.rank}: ${p.spaces.join(" → ")}  ${(p.share * 100).toFixed(1)} %`);
  }
}
const impact = solvePlan(demoPlans()[0]!.plan, constructionCatalogue, { source: { impactOnRoomId: "dance" }, receiver: "record", k: 3 });
if (impact.ok) {
  console.log(`fernhollow impact on the dance floor → record: ${impact.result.dba.toFixed(1)} dB(A)`);
  for (const e of impact.onPlan.elements.slice(0, 3)) console.log(`   ${e.kind.padEnd(8)} ${e.name.padEnd(44)} share ${(e.share * 100).toFixed(1)} %`);
}
