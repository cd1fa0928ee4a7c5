/** One published limit of angular distortion δ/L and what it guards against. */
export interface AngularDistortionLimit {
  readonly source: 'Bjerrum (1963)' | 'Skempton & MacDonald (1956)';
  /** The limit as a ratio, e.g. 1/500 = 0.002. */
  readonly angularDistortion: number;
  /** The limit as printed, e.g. '1/500'. */
  readonly ratioLabel: string;
  readonly description: string;
}

/**
 * Published limits of angular distortion, strictest first within each source.
 * Bjerrum (1963), Proc. European Conf. SMFE Wiesbaden, vol. 2, discussion
 * (the chart of limiting angular distortions); Skempton & MacDonald (1956),
 * "The allowable settlements of buildings", Proc. ICE 5(3):727–768.
 * The figures are those quoted in the textbooks (e.g. Das, *Principles of
 * Foundation Engineering*, tolerable settlement of buildings); the original
 * papers were not at hand to check them against.
 */
export const ANGULAR_DISTORTION_LIMITS: readonly AngularDistortionLimit[] = [
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 750, ratioLabel: '1/750', description: 'difficulties with machinery sensitive to settlement' },
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 600, ratioLabel: '1/600', description: 'danger to frames with diagonals' },
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 500, ratioLabel: '1/500', description: 'safe limit for buildings where cracking is not permissible' },
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 300, ratioLabel: '1/300', description: 'first cracking of panel walls; difficulties with overhead cranes' },
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 250, ratioLabel: '1/250', description: 'tilting of high rigid buildings becomes visible' },
  { source: 'Bjerrum (1963)', angularDistortion: 1 / 150, ratioLabel: '1/150', description: 'considerable cracking of panel and brick walls; structural damage of general buildings feared' },
  { source: 'Skempton & MacDonald (1956)', angularDistortion: 1 / 500, ratioLabel: '1/500', description: 'design limit recommended for frame buildings' },
  { source: 'Skempton & MacDonald (1956)', angularDistortion: 1 / 300, ratioLabel: '1/300', description: 'cracking of panel walls or partitions likely' },
  { source: 'Skempton & MacDonald (1956)', angularDistortion: 1 / 150, ratioLabel: '1/150', description: 'structural damage to beams and columns likely' },
];
