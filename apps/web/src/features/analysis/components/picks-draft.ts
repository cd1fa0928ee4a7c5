import { PicksUpdateSchema, type Picks, type PicksUpdate } from '@porestack/types';
import { numberOrNull } from '../../../lib/form-numbers';

/** The overrides as the form holds them; '' means "leave it to the method". */
export type PicksDraft = {
  preconsolidationStressKpa: string;
  virginFirst: string;
  virginLast: string;
  /** Per increment index: t90 (Taylor) and t50 (Casagrande), minutes; d100 (Casagrande), mm. */
  increments: Record<number, IncrementDraft>;
  /** Increments left out of the analysis: index → the reason as typed. */
  excluded: Record<number, string>;
  reason: string;
};

export type IncrementDraft = { t90Min: string; t50Min: string; d100Mm: string };
export const EMPTY_INCREMENT: IncrementDraft = { t90Min: '', t50Min: '', d100Mm: '' };

export type PicksErrors = Partial<Record<'preconsolidationStressKpa' | 'virginLine' | 'reason' | `t90-${number}` | `t50-${number}` | `d100-${number}` | `exclude-${number}`, string>>;

export function draftFromPicks(picks: Picks): PicksDraft {
  const increments: PicksDraft['increments'] = {};
  for (const p of picks.increments ?? []) {
    increments[p.index] = {
      t90Min: p.taylor?.t90Min === undefined ? '' : String(p.taylor.t90Min),
      t50Min: p.casagrande?.t50Min === undefined ? '' : String(p.casagrande.t50Min),
      d100Mm: p.casagrande?.d100Mm === undefined ? '' : String(p.casagrande.d100Mm),
    };
  }
  return {
    preconsolidationStressKpa: picks.preconsolidationStressKpa === undefined ? '' : String(picks.preconsolidationStressKpa),
    virginFirst: picks.virginLine ? String(picks.virginLine.firstIncrementIndex) : '',
    virginLast: picks.virginLine ? String(picks.virginLine.lastIncrementIndex) : '',
    increments,
    excluded: Object.fromEntries((picks.excludedIncrements ?? []).map((e) => [e.index, e.reason])),
    reason: '',
  };
}

const positiveOrError = (text: string, message: string): { value?: number; error?: string } => {
  const n = numberOrNull(text);
  if (n === null) return {};
  return typeof n === 'number' && n > 0 ? { value: n } : { error: message };
};

/** Checks the draft and builds the PUT body; d0 picks already saved for an increment are kept. */
export function picksUpdateFromDraft(draft: PicksDraft, saved: Picks): { ok: true; body: PicksUpdate } | { ok: false; errors: PicksErrors } {
  const errors: PicksErrors = {};
  const picks: Picks = {};
  const sigma = positiveOrError(draft.preconsolidationStressKpa, 'Enter σ′p as a stress above zero in kPa, or leave it blank for the method’s value.');
  if (sigma.error) errors.preconsolidationStressKpa = sigma.error;
  if (sigma.value !== undefined) picks.preconsolidationStressKpa = sigma.value;
  if (draft.virginFirst !== '' || draft.virginLast !== '') {
    const first = Number(draft.virginFirst);
    const last = Number(draft.virginLast);
    if (draft.virginFirst === '' || draft.virginLast === '' || !(last > first)) errors.virginLine = 'Choose the first and the last increment of the virgin line; the last must come after the first.';
    else picks.virginLine = { firstIncrementIndex: first, lastIncrementIndex: last };
  }
  const increments: NonNullable<Picks['increments']> = [];
  const indices = new Set([...Object.keys(draft.increments).map(Number), ...(saved.increments ?? []).map((p) => p.index)]);
  for (const index of [...indices].sort((a, b) => a - b)) {
    const entry = draft.increments[index] ?? EMPTY_INCREMENT;
    const before = saved.increments?.find((p) => p.index === index);
    const t90 = positiveOrError(entry.t90Min, `Increment ${index}: enter t90 in minutes above zero, or leave it blank.`);
    const t50 = positiveOrError(entry.t50Min, `Increment ${index}: enter t50 in minutes above zero, or leave it blank.`);
    const d100 = numberOrNull(entry.d100Mm);
    if (t90.error) errors[`t90-${index}`] = t90.error;
    if (t50.error) errors[`t50-${index}`] = t50.error;
    if (d100 !== null && typeof d100 !== 'number') errors[`d100-${index}`] = `Increment ${index}: enter d100 as a deformation in mm (as on the plot), or leave it blank.`;
    const taylor = { ...(before?.taylor?.d0Mm === undefined ? {} : { d0Mm: before.taylor.d0Mm }), ...(t90.value === undefined ? {} : { t90Min: t90.value }) };
    const casagrande = {
      ...(before?.casagrande?.d0Mm === undefined ? {} : { d0Mm: before.casagrande.d0Mm }),
      ...(typeof d100 === 'number' ? { d100Mm: d100 } : {}),
      ...(t50.value === undefined ? {} : { t50Min: t50.value }),
    };
    const hasTaylor = Object.keys(taylor).length > 0;
    const hasCasagrande = Object.keys(casagrande).length > 0;
    if (hasTaylor || hasCasagrande) increments.push({ index, ...(hasTaylor ? { taylor } : {}), ...(hasCasagrande ? { casagrande } : {}) });
  }
  if (increments.length > 0) picks.increments = increments;
  const excluded = Object.entries(draft.excluded).map(([index, reason]) => ({ index: Number(index), reason: reason.trim() }));
  for (const { index, reason } of excluded) if (reason.length < 3) errors[`exclude-${index}`] = `Increment ${index}: say why it is left out of the analysis (a few words at least).`;
  if (excluded.length > 0) picks.excludedIncrements = excluded.sort((a, b) => a.index - b.index);
  const parsed = PicksUpdateSchema.safeParse({ picks, reason: draft.reason });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      if (issue.path[0] === 'reason') errors.reason ??= issue.message;
      // Each left-out increment's reason is checked above, under its own field.
      else if (issue.path[1] === 'excludedIncrements') continue;
      else errors.preconsolidationStressKpa ??= issue.message;
    }
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}
