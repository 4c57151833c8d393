/** One outgoing e-mail: plain text first, the same words as simple HTML. */
export type Message = { to: string; subject: string; text: string; html: string; attachments?: { filename: string; content: Buffer; contentType: string }[] };
