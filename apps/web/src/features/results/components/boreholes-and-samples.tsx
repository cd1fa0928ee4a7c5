import type { ResultsBorehole } from '@porestack/types';
import { depthRange } from './parameter-format';

/** The project's boreholes with their samples, shallowest first, marking the samples with approved results. */
export function BoreholesAndSamples({ boreholes }: { boreholes: readonly ResultsBorehole[] }) {
  if (boreholes.length === 0) return <p className="text-sm text-slate-600">No boreholes are recorded for this project yet.</p>;
  return (
    <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
      {boreholes.map((b) => (
        <section key={b.id} aria-label={`Borehole ${b.name}`} className="rounded-md border border-slate-200">
          <header className="border-b border-slate-200 px-4 py-2">
            <h3 className="text-sm font-semibold text-slate-900">{b.name}</h3>
            <p className="text-xs text-slate-600">
              {b.groundLevelMOd === null ? 'Ground level not recorded' : `Ground level ${b.groundLevelMOd.toFixed(2)} m OD`} ·{' '}
              {b.waterTableDepthM === null ? 'no groundwater recorded' : `groundwater at ${b.waterTableDepthM.toFixed(2)} m`}
            </p>
          </header>
          {b.samples.length === 0 ? (
            <p className="px-4 py-3 text-sm text-slate-600">No samples recorded.</p>
          ) : (
            <ul className="divide-y divide-slate-100">
              {b.samples.map((s) => (
                <li key={s.id} className="px-4 py-2 text-sm">
                  <div className="flex items-baseline justify-between gap-3">
                    <span className="font-medium text-slate-800">
                      {s.reference} <span className="font-normal tabular-nums text-slate-600">{depthRange(s.topDepthM, s.bottomDepthM)}</span>
                    </span>
                    <span className={`shrink-0 text-xs ${s.issuedTestCount > 0 ? 'text-accent-700' : 'text-slate-500'}`}>
                      {s.issuedTestCount > 0 ? `${s.issuedTestCount} approved ${s.issuedTestCount === 1 ? 'result' : 'results'}` : 'no result yet'}
                    </span>
                  </div>
                  {s.description ? <p className="text-xs text-slate-600">{s.description}</p> : null}
                </li>
              ))}
            </ul>
          )}
        </section>
      ))}
    </div>
  );
}
