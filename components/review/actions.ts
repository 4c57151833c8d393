"use server";

import { z } from "zod";
import { audit } from "@/lib/audit";
import { runAction } from "@/lib/auth/authorize";
import { requestIp } from "@/lib/auth/request-context";
import { setNoSelfApproval } from "@/lib/review/firm-rule";

/** The firm's rule "a reviewer may not approve a revision they authored": firm owners only; audited. */
export async function setFirmReviewRuleAction(input: { noSelfApproval: boolean }) {
  return runAction(async () => {
    const i = z.object({ noSelfApproval: z.boolean({ error: "noSelfApproval must be true or false" }) }).parse(input);
    const r = await setNoSelfApproval(i.noSelfApproval);
    await audit({ actorId: r.actorId, action: "firm.review-rule", target: r.firmId, detail: { noSelfApproval: i.noSelfApproval }, ip: await requestIp() });
    return { noSelfApproval: r.noSelfApproval };
  });
}
