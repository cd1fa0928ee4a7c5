import type { FootingRow } from '@porestack/types';

/** Plan sides of a footing along x and y, m: B × L for a rectangle, B × B for a square and a circle's bounding square. */
export function planSides(footing: FootingRow): { alongXM: number; alongYM: number } {
  if (footing.shape === 'rectangle') return { alongXM: footing.widthM, alongYM: footing.lengthM ?? footing.widthM };
  return { alongXM: footing.widthM, alongYM: footing.widthM };
}

/** The footing's plan area, m². */
export function planAreaM2(footing: FootingRow): number {
  if (footing.shape === 'circle') return (Math.PI * footing.widthM * footing.widthM) / 4;
  const { alongXM, alongYM } = planSides(footing);
  return alongXM * alongYM;
}

/** Plan extent on x and y, m. */
export function planExtent(footing: FootingRow): { minX: number; maxX: number; minY: number; maxY: number } {
  const { alongXM, alongYM } = planSides(footing);
  return { minX: footing.xM - alongXM / 2, maxX: footing.xM + alongXM / 2, minY: footing.yM - alongYM / 2, maxY: footing.yM + alongYM / 2 };
}
