"use server";

import { z } from "zod";
import { audit } from "@/lib/audit";
import { runAction } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { setNoSelfApproval } from "@/lib/review/firm-rule";

/** The firm's rule "a reviewer may not approve a revision they authored": owners of the project's firm only; audited. */
export async function setFirmReviewRuleAction(input: { projectId: string; noSelfApproval: boolean }) {
  return runAction(async () => {
    const i = z.object({ projectId: z.uuid("must be a project id"), noSelfApproval: z.boolean({ error: "noSelfApproval must be true or false" }) }).parse(input);
    const r = await setNoSelfApproval(i.projectId, i.noSelfApproval);
    await audit({ actorId: r.actorId, action: "firm.review-rule", projectId: i.projectId, target: r.firmId, detail: { noSelfApproval: i.noSelfApproval }, ip: await requestIp() });
    return { noSelfApproval: r.noSelfApproval };
  });
}
