import { emitterAtFlow } from "@/lib/hydraulics/emitters/emitter-at-flow";
for (const m of [1e-6, 1e-4, 0.001, 0.01, 0.03, 0.1, 1, 10]) {

  const r = emitterAtFlow({ outputAtDt50W: 1500, exponentN: 1.3, flowC: 70, roomC: 20, massFlowKgs: m, specificHeatJkgK: 4180 });
  console.log(m, r.returnC);
}
