import { apiHandler } from "@/lib/auth/authorize";
import { compareDesigns } from "@/lib/compare/compare";

export const dynamic = "force-dynamic";

/** ?a={ref}&b={ref} (schematic:{id} | revision:{id}) → {a: {ref, name, metrics}, b, changes, scenarios}. */
export const GET = apiHandler(async (req: Request) => {
  const q = new URL(req.url).searchParams;
  const { comparison } = await compareDesigns({ a: q.get("a") ?? undefined, b: q.get("b") ?? undefined });
  return Response.json(comparison);
});
