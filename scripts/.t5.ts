import { pipeLaw } from "@/lib/hydraulics/network/behaviour";
const laws = Array.from({ length: 30000 }, (_, i) => pipeLaw({ innerDiameterM: 0.0136 + (i % 5) * 0.006, roughnessM: 1.5e-6, lengthM: 3, sumK: 1.2 }, 990, 6.3e-7));
const out = new Float64Array(2);
for (let rep = 0; rep < 6; rep++) {
  const c = process.cpuUsage();
  for (let k = 0; k < laws.length; k++) laws[k]!(0.05 + (k % 100) * 0.01 + rep * 1e-3, out);
  console.log("eval 30k", process.cpuUsage(c).user / 1000, "ms");
}
