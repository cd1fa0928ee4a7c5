/**
 * Plan shape of a footing.
 * - 'rectangle': widthM along x, lengthM along y.
 * - 'square': widthM on each side (lengthM, if given, must equal it).
 * - 'circle': widthM is the diameter D.
 * - 'strip': a long footing in plane strain, widthM across (along x), infinitely
 *   long along y; its plan position (xM, yM) is the centre line's x and the
 *   station along it at which it is evaluated and its neighbours' effects taken.
 */
export type FootingShape = 'rectangle' | 'square' | 'circle' | 'strip';

/**
 * How a footing's load is given, exactly one of: a total load (rectangle,
 * square, circle), a load per metre run (strip), or a uniform bearing
 * pressure (any shape).
 */
export type FootingLoad =
  | { readonly loadKn: number; readonly pressureKpa?: never; readonly loadKnPerM?: never }
  | { readonly pressureKpa: number; readonly loadKn?: never; readonly loadKnPerM?: never }
  | { readonly loadKnPerM: number; readonly loadKn?: never; readonly pressureKpa?: never };

/** A footing's plan dimensions by shape (m); shape omitted means a rectangle. */
export type FootingPlan =
  | { readonly shape?: 'rectangle'; readonly widthM: number; readonly lengthM: number }
  | { readonly shape: 'square'; readonly widthM: number; readonly lengthM?: number }
  | { readonly shape: 'circle'; readonly widthM: number; readonly lengthM?: never }
  | { readonly shape: 'strip'; readonly widthM: number; readonly lengthM?: never };

/**
 * Whether a footing's load or pressure is net — the increase of stress at
 * founding level — or gross — everything the base carries, of which the
 * overburden removed to found it (σv0 at the founding depth) is not new.
 */
export type PressureBasis = 'net' | 'gross';

/**
 * A footing on plan. x runs along the width, y along the length; coordinates
 * and the founding depth are in metres. The load or pressure is net (the
 * default) or gross (pressureBasis 'gross': the net increase is then the gross
 * pressure less σv0 at the founding depth, from the soil profile).
 */
export type Footing = FootingLoad &
  FootingPlan & {
    readonly id: string;
    /** Default 'net'. */
    readonly pressureBasis?: PressureBasis;
    /** Centre of the footing on plan, m (for a strip: its centre line's x, and the station along it). */
    readonly xM: number;
    readonly yM: number;
    /** Founding depth of the base below ground level, m (≥ 0). */
    readonly depthM: number;
  };

/** The way stress spreads below a footing. */
export type StressMethod = 'boussinesq' | '2to1';
