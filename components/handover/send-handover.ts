import "server-only";
import { z } from "zod";
import { db } from "@/lib/db";
import { audit } from "@/lib/audit";
import { requireProjectRole } from "@/lib/auth/authorize";
import { UserError } from "@/lib/auth/errors";
import { takeHandoverSend } from "@/lib/auth/rate-limit";
import { requestIp } from "@/lib/auth/request-context";
import { requireRevisionAccess } from "@/lib/auth/revision-access";
import { getProjectHead } from "@/db/queries/project-admin";
import { FIRST_CAUTION_LINE } from "@/lib/handover/cautions";
import { handoverMessage, sendMail } from "@/lib/mail";
import { readReport, reportFileName, reportPdf } from "./report-service";

// Send: the issued revision's report, attached as a PDF, to the client's address (the
// project's, unless the sender gives another), through the mail path; then a `handover` row
// in the revision history and the audit log. Owners and designers (policy "handover.send"),
// within the hourly budgets of lib/auth/rate-limit.ts (per sender and per address).

export const handoverInput = z.object({
  to: z.email("to must be an e-mail address, like name@example.com").max(254, "to must be at most 254 characters").optional(),
});

export async function sendHandover(revisionId: string, raw: unknown): Promise<{ to: string; file: string; bytes: number; at: string }> {
  const access = await requireRevisionAccess(revisionId);
  const projectId = access.schematic.projectId;
  const { user } = await requireProjectRole(projectId, "handover.send");
  const input = handoverInput.parse(raw ?? {});
  if (access.revisionStatus !== "issued") throw new UserError(409, `Only an issued revision is handed over; this one is ${access.revisionStatus}.`);
  const project = await getProjectHead(projectId);
  const to = input.to ?? project?.clientEmail ?? "";
  if (!to) {
    throw new z.ZodError([{ code: "custom", path: ["to"], message: "the project has no client e-mail: give one here, or add it to the project's details", input: raw }]);
  }
  await takeHandoverSend(user.id, to);
  const report = await readReport(revisionId);
  const { bytes } = await reportPdf(report);
  const file = reportFileName(report, "pdf");
  try {
    await sendMail(handoverMessage({ to, client: report.input.project.client, project: report.input.project.name, schematic: report.input.schematicName,
      revision: report.input.revision.number, firm: report.input.project.firm, sender: user.name, caution: FIRST_CAUTION_LINE, file: { filename: file, content: bytes } }));
  } catch (e) {
    console.error("handover mail failed", e);
    throw new UserError(503, "The e-mail could not be sent just now (the mail server did not accept it); nothing was logged. Try again in a few minutes.");
  }
  const [row] = await db()("revision_events").insert({ schematic_id: access.schematic.id, revision_id: revisionId, kind: "handover", actor_id: user.id,
    detail: JSON.stringify({ to, file, bytes: bytes.length }) }).returning("at");
  await audit({ actorId: user.id, action: "handover.sent", projectId, target: to, detail: { revisionId, file }, ip: await requestIp() });
  return { to, file, bytes: bytes.length, at: new Date(row.at).toISOString() };
}
