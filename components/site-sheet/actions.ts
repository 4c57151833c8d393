"use server";
import { z } from "zod";
import { requireProjectRole, runAction, type ActionResult } from "@/lib/auth/authorize";
import { audit } from "@/lib/audit";
import { pressureTestRuleSchema } from "@/lib/site/pressure-test";
import { saveSiteRules, type SiteRules } from "@/lib/site/rules";

/** The firm's pressure-test rule (allowed drop, hold time, the basis it cites): project owners. */
export async function saveSiteRulesAction(input: { projectId: string; pressureTest: unknown }): Promise<ActionResult<SiteRules>> {
  return runAction(async () => {
    const { projectId } = z.object({ projectId: z.string() }).parse(input);
    const { user } = await requireProjectRole(projectId, "site.rules");
    const rule = pressureTestRuleSchema.parse(input.pressureTest);
    const saved = await saveSiteRules(projectId, rule);
    await audit({ actorId: user.id, action: "site.rules", projectId, detail: { pressureTest: rule } });
    return saved;
  });
}
