import { z } from 'zod';
import { IssuedReportSchema } from '../lab/reports.js';
import { ActorSchema, isoDateTime } from './design-fields.js';

/**
 * A settlement check revision a designer has issued: the run is frozen already; issuing it
 * chooses it as the one to hand over, once, and prints its PDF summary. Clients of the
 * project see issued revisions only.
 */
export const IssuedCheckSchema = z.object({
  checkId: z.uuid(),
  checkName: z.string(),
  revision: z.number().int(),
  revisionId: z.uuid(),
  issuedBy: ActorSchema,
  issuedAt: isoDateTime,
  report: IssuedReportSchema,
});
export type IssuedCheck = z.infer<typeof IssuedCheckSchema>;
