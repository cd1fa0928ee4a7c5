import type { FootingRow, FootingRowInput } from '@porestack/types';
import { numberOrNull } from '../../../lib/form-numbers';

/** A footing row as the table holds it: numbers as typed text. */
export interface FootingDraft {
  key: string;
  id: string;
  shape: FootingRow['shape'];
  widthM: string;
  lengthM: string;
  depthM: string;
  loadKind: FootingRow['loadKind'];
  load: string;
  loadBasis: FootingRow['loadBasis'];
  xM: string;
  yM: string;
}

let next = 0;
const text = (value: number | null) => (value === null ? '' : String(value));

export function footingDraft(row: FootingRow): FootingDraft {
  next += 1;
  return {
    key: `footing-${next}`,
    id: row.id,
    shape: row.shape,
    widthM: text(row.widthM),
    lengthM: text(row.lengthM),
    depthM: text(row.depthM),
    loadKind: row.loadKind,
    load: text(row.load),
    loadBasis: row.loadBasis,
    xM: text(row.xM),
    yM: text(row.yM),
  };
}

export function blankFooting(index: number): FootingDraft {
  next += 1;
  return { key: `footing-${next}`, id: `F${index + 1}`, shape: 'square', widthM: '', lengthM: '', depthM: '', loadKind: 'load', load: '', loadBasis: 'net', xM: '', yM: '' };
}

/** The row as the API takes it; unreadable numbers stay text so the schema names the cell. */
export function footingInput(draft: FootingDraft): FootingRowInput {
  const num = (value: string) => numberOrNull(value) as number;
  return {
    id: draft.id,
    shape: draft.shape,
    widthM: num(draft.widthM),
    lengthM: draft.shape === 'rectangle' ? (numberOrNull(draft.lengthM) as number | null) : null,
    depthM: num(draft.depthM),
    loadKind: draft.loadKind,
    load: num(draft.load),
    loadBasis: draft.loadBasis,
    xM: num(draft.xM),
    yM: num(draft.yM),
  };
}
