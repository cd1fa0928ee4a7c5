import { FOOTING_COLUMN_HEADINGS } from '@porestack/types';
import type { z } from 'zod';
import { DomainError } from '../../errors/domain-error.js';
import { parse } from '../../http/parse.js';

/**
 * parse() for a check's body, with every problem in the footing schedule named by its row, mark
 * and column ("Row 3 (F3), B (m): …") instead of a path like footings.2.widthM.
 */
export function parseCheckBody<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  try {
    return parse(schema, body);
  } catch (error) {
    if (!(error instanceof DomainError) || !error.issues) throw error;
    const footings = (body as { footings?: Array<{ id?: unknown }> } | null)?.footings;
    const issues = error.issues.map((issue) => {
      const match = /^footings\.(\d+)(?:\.(\w+))?/.exec(issue.path);
      if (!match) return issue;
      const index = Number(match[1]);
      const mark = footings?.[index]?.id;
      const column = match[2] as keyof typeof FOOTING_COLUMN_HEADINGS | undefined;
      const heading = column && column in FOOTING_COLUMN_HEADINGS ? `, ${FOOTING_COLUMN_HEADINGS[column]}` : '';
      return { path: issue.path, message: `Row ${index + 1}${typeof mark === 'string' && mark !== '' ? ` (${mark})` : ''}${heading}: ${issue.message}` };
    });
    const first = issues[0]?.message ?? '';
    throw new DomainError('validation_failed', `The check was not saved. ${first}${issues.length > 1 ? ` (and ${issues.length - 1} more problem${issues.length === 2 ? '' : 's'} listed)` : ''}`, issues);
  }
}
