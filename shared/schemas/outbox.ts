import { z } from "zod";

/** One message caught by the development mail server, as the Outbox page lists it. */
export const OutboxMessageSchema = z.object({
  id: z.uuid(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  createdAt: z.iso.datetime({ offset: true }),
  /** True when the message is another person's and the token of its links was taken out. */
  linksHidden: z.boolean(),
});
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>;

/** GET /api/outbox (owners, development only) */
export const OutboxResponseSchema = z.object({ messages: z.array(OutboxMessageSchema) });
export type OutboxResponse = z.infer<typeof OutboxResponseSchema>;
