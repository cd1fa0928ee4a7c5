import type { SoilProfile } from '../profile/soil-profile.types.js';
import { verticalStressAtDepth } from '../profile/vertical-stress-at-depth.js';
import { footingPressureKpa } from './footing-pressure.js';
import type { Footing, PressureBasis } from './footing.types.js';

/** The pressure a footing adds at founding level, and how it was had. */
export interface NetFootingPressure {
  readonly pressureBasis: PressureBasis;
  /** Net pressure used for stresses and settlements, kPa (≥ 0: a footing that removes more than it adds is taken as 0). */
  readonly netPressureKpa: number;
  /** The gross pressure as given (load over area), kPa; null for a net load. */
  readonly grossPressureKpa: number | null;
  /** σv0 at the founding depth, taken off a gross pressure, kPa; null for a net load. */
  readonly overburdenRemovedKpa: number | null;
  /** Plain words when the net pressure had to be set to zero. */
  readonly warnings: readonly string[];
}

/**
 * The net bearing pressure of a footing: the pressure given (or load over
 * area, footingPressureKpa) when it is net; when it is gross, the gross
 * pressure less the overburden removed to found it, q_net = q_gross − σv0(Df),
 * σv0 the total vertical stress at the founding depth Df from the ground
 * model (ground level flat, the excavation backfilled to the base only).
 * A gross pressure below σv0 unloads the ground: the net pressure is taken as
 * 0 — the footing adds no stress, which errs towards settlement under its
 * neighbours — and a warning says so; heave is outside these checks.
 *
 * Source: Das, *Principles of Foundation Engineering*, net allowable bearing
 * pressure (q_net = q − γDf); Tomlinson, *Foundation Design and Construction*,
 * net foundation pressure for settlement.
 *
 * @param footing the footing (m; kN, kN/m or kPa; pressureBasis)
 * @param profile the ground model, for σv0 at the founding depth (m, kN/m³)
 * @returns net pressure (kPa), the gross pressure and overburden where gross, and any warning
 * @throws RangeError as footingPressureKpa, for a negative gross pressure, an unknown basis, or a founding depth outside the profile
 * @example netFootingPressure({ id: 'F1', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1.5, loadKn: 800, pressureBasis: 'gross' }, profile) // netPressureKpa 173 where σv0(1.5 m) = 27 kPa
 */
export function netFootingPressure(footing: Footing, profile: SoilProfile): NetFootingPressure {
  const pressureBasis = footing.pressureBasis ?? 'net';
  const pressureKpa = footingPressureKpa(footing);
  if (pressureBasis === 'net') return { pressureBasis, netPressureKpa: pressureKpa, grossPressureKpa: null, overburdenRemovedKpa: null, warnings: [] };
  if (pressureBasis !== 'gross') throw new RangeError(`netFootingPressure requires pressureBasis 'net' or 'gross' (footing ${footing.id})`);
  if (!(pressureKpa >= 0)) throw new RangeError(`netFootingPressure requires a gross load or pressure >= 0 (footing ${footing.id})`);
  const overburdenRemovedKpa = verticalStressAtDepth(profile, footing.depthM).totalStressKpa;
  const net = pressureKpa - overburdenRemovedKpa;
  const warnings =
    net < 0
      ? [
          `Footing ${footing.id}: its gross pressure of ${pressureKpa.toFixed(1)} kPa is less than the overburden removed to found it, ${overburdenRemovedKpa.toFixed(1)} kPa at ${footing.depthM} m, so it unloads the ground. Its net pressure is taken as 0: it adds no stress, and heave is not worked out. Check the load and the founding depth.`,
        ]
      : [];
  return { pressureBasis, netPressureKpa: Math.max(0, net), grossPressureKpa: pressureKpa, overburdenRemovedKpa, warnings };
}
