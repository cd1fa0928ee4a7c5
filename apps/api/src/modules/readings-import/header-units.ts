import type { LengthUnit, StressUnit, TimeUnit } from '@porestack/types';

/** Lower case, accents and the Greek sigma's variants folded, so "Spannung [kgf/cm²]" and "tensao" compare plainly. */
export function foldText(text: string): string {
  return text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/²/g, '2').replace(/μ/g, 'µ').trim();
}

/** A header split into its words and the unit written with it, both folded. */
export interface HeaderParts {
  readonly words: readonly string[];
  readonly unit: string | null;
}

const BRACKETED = /[[(]([^[\]()]*)[\])]\s*$/;
const BRACKETED_ANYWHERE = /[[(]([^[\]()]*)[\])]/;
const TRAILING_UNIT = /(?:\s+in\s+|\s*\/\s*|\s*,\s*|_|\s+)([a-zµ/.0-9:]+)$/;

/**
 * The words of a column name and its unit: in brackets or parentheses ("Zeit [s]",
 * "Pressure (tsf)"), or after a slash, comma, underscore or "in" when it is a known unit
 * ("t / min", "stress_kpa", "Zeit in s").
 */
export function splitHeader(header: string): HeaderParts {
  const folded = foldText(header);
  let unit: string | null = null;
  let rest = folded;
  const bracket = BRACKETED.exec(folded) ?? BRACKETED_ANYWHERE.exec(folded);
  if (bracket) {
    unit = (bracket[1] as string).trim();
    rest = folded.replace(bracket[0], ' ');
  } else {
    const trailing = TRAILING_UNIT.exec(folded);
    if (trailing && isKnownUnit(trailing[1] as string)) {
      unit = trailing[1] as string;
      rest = folded.slice(0, trailing.index);
    }
  }
  const words = rest.split(/[^a-z0-9µσ'′#°]+/).filter((word) => word !== '');
  return { words, unit: unit === '' ? null : unit };
}

function isKnownUnit(text: string): boolean {
  return stressUnitOf(text) !== null || timeUnitOf(text) !== null || lengthUnitOf(text) !== null;
}

const compact = (unit: string): string => unit.replace(/\s+/g, '').replace(/\^/g, '');

/** A stress unit as written: kPa, kN/m², kgf/cm² (kg/cm², kp/cm²), tsf (ton/ft²), psi, MPa (MN/m², N/mm²). */
export function stressUnitOf(unit: string): StressUnit | null {
  const u = compact(unit);
  if (/^(kpa|kn\/m2)$/.test(u)) return 'kPa';
  if (/^(kgf|kg|kp)\/cm2$/.test(u) || u === 'kgf') return 'kgfPerCm2';
  if (/^(tsf|tons?\/ft2|t\/ft2)$/.test(u)) return 'tsf';
  if (/^(psi|lbf?\/in2)$/.test(u)) return 'psi';
  if (/^(mpa|mn\/m2|n\/mm2)$/.test(u)) return 'MPa';
  return null;
}

/** A time unit as written (English, German, French, Spanish, Portuguese, Italian), or a duration format. */
export function timeUnitOf(unit: string): TimeUnit | 'duration' | null {
  const u = compact(unit);
  if (/^\[?h+\]?:mm(:ss)?(\.0+)?$/.test(u) || u === 'h:m:s') return 'duration';
  if (/^(s|sec|secs|second|seconds|sek|sekunden|seg|segundos|secondes|secondi)$/.test(u)) return 's';
  if (/^(min|mins|minute|minutes|minuten|minutos|minuti)$/.test(u)) return 'min';
  if (/^(h|hr|hrs|hour|hours|std|stunden|heures|horas|ore)$/.test(u)) return 'h';
  if (/^(d|day|days|tage|jours|j|dias|giorni)$/.test(u)) return 'd';
  return null;
}

/**
 * A length unit as written, with the size of one division when the unit gives it: mm and
 * inches (one division = one unit), µm (0.001 mm), "0.01 mm" or "1/100 mm", "0.0001 in".
 * "div" (a gauge division of unknown size) gives a null division: it must be asked.
 */
export function lengthUnitOf(unit: string): { unit: LengthUnit; division: number | null } | null {
  const u = compact(unit).replace(',', '.');
  if (u === 'mm') return { unit: 'mm', division: 1 };
  if (/^(in|inch|inches|")$/.test(u)) return { unit: 'in', division: 1 };
  if (/^(µm|um|micron|microns)$/.test(u)) return { unit: 'mm', division: 0.001 };
  const scaled = /^(\d*\.?\d+)(mm|in)$/.exec(u);
  if (scaled) return { unit: scaled[2] as LengthUnit, division: Number(scaled[1]) };
  const fraction = /^1\/(\d+)(mm|in)$/.exec(u);
  if (fraction) return { unit: fraction[2] as LengthUnit, division: 1 / Number(fraction[1]) };
  if (/^(div|divs|divisions?|digits?|teilstriche?)$/.test(u)) return { unit: 'mm', division: null };
  return null;
}
