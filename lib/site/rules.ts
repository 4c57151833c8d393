import "server-only";
import { z } from "zod";
import { firmSiteRules, saveFirmSiteRules } from "@/db/queries/site-events";
import { DEFAULT_PRESSURE_TEST_RULE, pressureTestRuleSchema, type PressureTestRule } from "./pressure-test";

// The firm's site rules (organisations.site_rules): the pressure test's allowed drop, hold
// time and the basis the firm cites. Unset or unreadable → the common-practice default.

export const siteRulesSchema = z.object({ pressureTest: pressureTestRuleSchema });
export type SiteRules = z.output<typeof siteRulesSchema>;

export async function siteRulesOf(projectId: string): Promise<SiteRules> {
  const row = await firmSiteRules(projectId);
  const parsed = siteRulesSchema.safeParse(row?.rules);
  return parsed.success ? parsed.data : { pressureTest: DEFAULT_PRESSURE_TEST_RULE };
}

export async function saveSiteRules(projectId: string, pressureTest: PressureTestRule): Promise<SiteRules> {
  const row = await firmSiteRules(projectId);
  if (!row) throw new Error("project without a firm");
  const rules = { pressureTest };
  await saveFirmSiteRules(row.organisationId, rules);
  return rules;
}
