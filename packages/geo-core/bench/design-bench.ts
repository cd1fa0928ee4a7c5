// Speed of the whole settlement check at the size issue 4 names: 100 footings,
// each evaluated under its centre and four corners, over 40 sublayers, with
// every neighbour's stress and elastic settlement included (Boussinesq).
// Run: npx tsx bench/design-bench.ts (or pnpm run bench:design).
import { performance } from 'node:perf_hooks';
import { runSettlementCheck } from '../src/settlement/run-settlement-check.js';
import type { SoilProfile } from '../src/profile/soil-profile.types.js';
import type { Footing } from '../src/stress/footing.types.js';

// An invented site: 3 m of medium dense sand over 16 m of soft to firm clay on gravel.
const profile: SoilProfile = {
  groundLevelM: 4.2,
  waterTableDepthM: 1.8,
  layers: [
    { name: 'sand', thicknessM: 3, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 20, elasticModulusKpa: 25_000, poissonRatio: 0.3 },
    {
      name: 'clay',
      thicknessM: 16,
      unitWeightKnPerM3: 18.5,
      saturatedUnitWeightKnPerM3: 18.5,
      e0: 1.05,
      cc: 0.32,
      cs: 0.05,
      ocr: 1.6,
      cvM2PerYr: 1.8,
      cAlpha: 0.012,
      elasticModulusKpa: 6_000,
      poissonRatio: 0.35,
      drainageTop: 'free',
      drainageBottom: 'free',
    },
  ],
};

const footings: Footing[] = Array.from({ length: 100 }, (_, index) => ({
  id: `F${index + 1}`,
  xM: (index % 10) * 6,
  yM: Math.floor(index / 10) * 6,
  widthM: 2.5,
  lengthM: 2.5 + (index % 3) * 0.5,
  depthM: 1.5,
  loadKn: 900 + (index % 7) * 60,
}));

const options = { sublayerCount: 40, includeNeighbours: true, stressMethod: 'boussinesq', evaluationPoints: 'centre-and-corners' } as const;

const firstStart = performance.now();
const first = runSettlementCheck({ profile, footings, options });
const firstMs = performance.now() - firstStart;

const runs: number[] = [];
for (let run = 0; run < 10; run += 1) {
  const start = performance.now();
  runSettlementCheck({ profile, footings, options });
  runs.push(performance.now() - start);
}
runs.sort((a, b) => a - b);
const median = (runs[4]! + runs[5]!) / 2;

const sublayers = first.footings[0]?.sublayers.length ?? 0;
console.log(`settlement check: ${footings.length} footings × 5 points × ${sublayers} sublayers, neighbours included (Boussinesq)`);
console.log(`first run ${firstMs.toFixed(0)} ms; median of 10 warm runs ${median.toFixed(0)} ms (fastest ${runs[0]!.toFixed(0)} ms, slowest ${runs[9]!.toFixed(0)} ms)`);
console.log(`largest centre total ${Math.max(...first.footings.map((f) => f.totalM * 1000)).toFixed(1)} mm; ${first.pairs.length} pairs judged`);

// The same grid with every footing a circle of the rectangles' width (issue 8's shapes): each neighbour's stress is
// a rim integral whose number of points grows near the rim, and its immediate settlement a displacement integral.
const circles: Footing[] = footings.map((footing) => ({ id: footing.id, shape: 'circle', xM: footing.xM, yM: footing.yM, widthM: footing.widthM, depthM: footing.depthM, loadKn: footing.loadKn ?? 0 }));
const circleFirstStart = performance.now();
runSettlementCheck({ profile, footings: circles, options });
const circleFirstMs = performance.now() - circleFirstStart;
const circleRuns: number[] = [];
for (let run = 0; run < 5; run += 1) {
  const start = performance.now();
  runSettlementCheck({ profile, footings: circles, options });
  circleRuns.push(performance.now() - start);
}
circleRuns.sort((a, b) => a - b);
console.log(`the same grid as 100 circles: first run ${circleFirstMs.toFixed(0)} ms; median of 5 warm runs ${circleRuns[2]!.toFixed(0)} ms (fastest ${circleRuns[0]!.toFixed(0)} ms)`);
