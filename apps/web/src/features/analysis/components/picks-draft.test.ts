import { describe, expect, it } from 'vitest';
import { draftFromPicks, picksUpdateFromDraft } from './picks-draft';

describe('picksUpdateFromDraft(draft, saved)', () => {
  const empty = draftFromPicks({});

  it('requires a reason for any override', () => {
    const result = picksUpdateFromDraft({ ...empty, preconsolidationStressKpa: '120' }, {});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.reason).toMatch(/Say why/);
  });

  it('builds σ′p, the virgin line and an increment’s t90 with the reason', () => {
    const draft = { ...empty, preconsolidationStressKpa: '118.5', virginFirst: '5', virginLast: '8', increments: { 4: { t90Min: '6.2', t50Min: '', d100Mm: '' } }, reason: 'Curve bends later than the spline says' };
    expect(picksUpdateFromDraft(draft, {})).toEqual({
      ok: true,
      body: {
        picks: { preconsolidationStressKpa: 118.5, virginLine: { firstIncrementIndex: 5, lastIncrementIndex: 8 }, increments: [{ index: 4, taylor: { t90Min: 6.2 } }] },
        reason: 'Curve bends later than the spline says',
      },
    });
  });

  it('refuses a virgin line that ends before it starts', () => {
    const result = picksUpdateFromDraft({ ...empty, virginFirst: '6', virginLast: '4', reason: 'steeper part' }, {});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.virginLine).toMatch(/last must come after the first/);
  });

  it('refuses a negative t90 and names the increment', () => {
    const result = picksUpdateFromDraft({ ...empty, increments: { 3: { t90Min: '-1', t50Min: '', d100Mm: '' } }, reason: 'checked by hand' }, {});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors['t90-3']).toMatch(/^Increment 3/);
  });

  it('keeps d0 picks saved earlier for the same increment', () => {
    const saved = { increments: [{ index: 2, taylor: { d0Mm: 0.12 } }] };
    const result = picksUpdateFromDraft({ ...draftFromPicks(saved), increments: { 2: { t90Min: '4', t50Min: '', d100Mm: '' } }, reason: 'seating' }, saved);
    expect(result.ok && result.body.picks.increments).toEqual([{ index: 2, taylor: { d0Mm: 0.12, t90Min: 4 } }]);
  });

  it('picks d100 for an increment, as the warnings ask, and keeps one picked before unless cleared', () => {
    const result = picksUpdateFromDraft({ ...empty, increments: { 5: { t90Min: '', t50Min: '', d100Mm: '1,215' } }, reason: 'tail bends late' }, {});
    expect(result.ok && result.body.picks.increments).toEqual([{ index: 5, casagrande: { d100Mm: 1.215 } }]);
    const saved = { increments: [{ index: 5, casagrande: { d100Mm: 1.2 } }] };
    const kept = picksUpdateFromDraft({ ...draftFromPicks(saved), reason: 'other pick' }, saved);
    expect(kept.ok && kept.body.picks.increments).toEqual([{ index: 5, casagrande: { d100Mm: 1.2 } }]);
    const cleared = picksUpdateFromDraft({ ...draftFromPicks(saved), increments: { 5: { t90Min: '', t50Min: '', d100Mm: '' } }, reason: 'back to the construction' }, saved);
    expect(cleared.ok && cleared.body.picks.increments).toBeUndefined();
  });

  it('leaves an increment out of the analysis only with its own reason', () => {
    expect(picksUpdateFromDraft({ ...empty, excluded: { 6: '' }, reason: 'gauge knocked' }, {})).toEqual({ ok: false, errors: { 'exclude-6': 'Increment 6: say why it is left out of the analysis (a few words at least).' } });
    const result = picksUpdateFromDraft({ ...empty, excluded: { 6: ' gauge knocked at 3 h ' }, reason: 'leaving 6 out' }, {});
    expect(result.ok && result.body.picks).toEqual({ excludedIncrements: [{ index: 6, reason: 'gauge knocked at 3 h' }] });
    expect(draftFromPicks({ excludedIncrements: [{ index: 6, reason: 'gauge knocked at 3 h' }] }).excluded).toEqual({ 6: 'gauge knocked at 3 h' });
  });
});
