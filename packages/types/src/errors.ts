import { z } from 'zod';

/** Every error the API answers with has this body. */
export const ApiErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  /** Field-level problems of a rejected request body or query. */
  issues: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
});
export type ApiError = z.infer<typeof ApiErrorSchema>;
