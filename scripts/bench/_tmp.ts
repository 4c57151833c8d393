import { benchSolverVsEpanet } from "@/scripts/bench/solver-vs-epanet";
import { benchCalcVsJson, benchOptimiseHall } from "@/scripts/bench/calc-vs-json";
const what = process.argv[2] ?? "all";
(async () => {
  if (what === "all" || what === "solve") await benchSolverVsEpanet((process.env.BENCH_EPANET_SIZES ?? "1000,10000").split(",").map(Number));
  if (what === "all" || what === "calc") benchCalcVsJson();
  if (what === "all" || what === "opt") benchOptimiseHall();
})();
