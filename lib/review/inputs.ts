/**
 * The review API's inputs, one zod schema each (client-safe: the board's forms use the
 * same limits). Messages are plain text; the board shows them as text, links made
 * clickable (linkify.ts), never as HTML.
 */
import { z } from "zod";

export const MESSAGE_MAX = 10_000;

export const messageBody = z.string({ error: "a message is needed" })
  .refine((s) => s.trim().length > 0, "write something: the message is empty")
  .refine((s) => s.length <= MESSAGE_MAX, `at most ${MESSAGE_MAX.toLocaleString("en")} characters (a long report can go in a few messages)`);

export const anchorInput = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("part"), id: z.string().min(1, "name the part").max(120) }),
  z.object({ kind: z.literal("pipe"), id: z.string().min(1, "name the pipe").max(120) }),
  z.object({ kind: z.literal("schematic"), id: z.null({ error: "a thread on the whole schematic has no id" }).optional() }),
], { error: 'anchor.kind must be "part", "pipe" or "schematic"' });

export const newThreadInput = z.object({
  anchor: anchorInput,
  body: messageBody,
  revisionId: z.uuid("must be a revision id").optional(),
});

export const replyInput = z.object({ body: messageBody });
export const resolveInput = z.object({ resolved: z.boolean({ error: "resolved must be true or false" }) });
export const editInput = z.object({ body: messageBody });

export const statusInput = z.object({
  status: z.enum(["draft", "in-review", "approved", "issued"], { error: 'status must be "draft", "in-review", "approved" or "issued"' }),
  reason: z.string().max(10_000).optional(),
});

/** `?revision=N`: a revision number of the schematic. */
export const revisionNumberParam = z.coerce.number({ error: "must be a revision number" })
  .int("must be a whole revision number").min(1, "revision numbers start at 1").optional();

export type AnchorInput = z.infer<typeof anchorInput>;
