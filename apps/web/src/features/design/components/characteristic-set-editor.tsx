import { SET_PARAMETER_LABELS, SET_PARAMETERS, type AdoptedValue, type AdoptionBasis, type CharacteristicSetDetail, type ParameterStatistics, type SetParameter } from '@porestack/types';
import { useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Panel } from '../../../components/panel';
import { LoadingBlock } from '../../../components/spinner';
import { TextField } from '../../../components/text-field';
import { numberOrNull } from '../../../lib/form-numbers';
import { useSaveCharacteristicSet, useSetStatistics } from '../api/characteristic-sets';
import { useDesignRecords } from '../api/design-records';
import { formatNumber } from './design-format';
import { SetDepthPlots } from './set-depth-plots';
import { TableHead } from './table-head';

type Adoption = { basis: AdoptionBasis; value: string; note: string };

type CharacteristicSetEditorProps = {
  orgId: string;
  projectId: string;
  setId: string | null;
  initial: { name: string; note: string; versionIds: string[]; adopted: Partial<Record<SetParameter, Adoption>> };
  canEdit: boolean;
  onSaved: (set: CharacteristicSetDetail) => void;
};

const BASIS_WORDS: Record<AdoptionBasis, string> = {
  mean: 'mean',
  'student-t-bound': '95 % bound on the mean (Student t)',
  schneider: 'Schneider (1997)',
  chosen: 'my own value',
};

function valueFor(basis: AdoptionBasis, stats: ParameterStatistics | undefined): number | null {
  if (!stats) return null;
  if (basis === 'mean') return stats.mean;
  if (basis === 'student-t-bound') return stats.characteristicStudentT;
  if (basis === 'schneider') return stats.characteristicSchneider;
  return null;
}

const rounded = (value: number | null) => (value === null ? '' : String(Number(value.toPrecision(3))));

/**
 * A characteristic set: pick the approved versions of one stratum, read each parameter's
 * statistics side by side, adopt a value per parameter with a note, and save a revision that
 * records which versions it used.
 */
export function CharacteristicSetEditor({ orgId, projectId, setId, initial, canEdit, onSaved }: CharacteristicSetEditorProps) {
  const [name, setName] = useState(initial.name);
  const [note, setNote] = useState(initial.note);
  const [versionIds, setVersionIds] = useState<string[]>(initial.versionIds);
  const [adopted, setAdopted] = useState<Partial<Record<SetParameter, Adoption>>>(initial.adopted);
  const [borehole, setBorehole] = useState('');
  const records = useDesignRecords(orgId, projectId);
  const statistics = useSetStatistics(orgId, projectId, versionIds);
  const save = useSaveCharacteristicSet(orgId, projectId, setId);
  const statsOf = (parameter: SetParameter) => statistics.data?.statistics.find((s) => s.parameter === parameter);
  const adoptedValues: Partial<Record<SetParameter, AdoptedValue>> = Object.fromEntries(
    Object.entries(adopted).map(([key, a]) => [key, { value: numberOrNull(a.value) as number | null, basis: a.basis, note: a.note }]),
  );
  const listed = (records.data ?? []).filter((r) => borehole === '' || r.boreholeName.toLowerCase().includes(borehole.toLowerCase()) || versionIds.includes(r.versionId));
  // Members kept from an earlier revision may be older versions than the ones listed.
  const olderMembers = records.data ? versionIds.filter((id) => !records.data.some((r) => r.versionId === id)) : [];

  return (
    <form
      aria-label="Characteristic set"
      className="space-y-6"
      onSubmit={(event) => {
        event.preventDefault();
        save.mutate({ name, note, versionIds, adopted: adoptedValues }, { onSuccess: onSaved });
      }}
    >
      <Panel title="Stratum and records" description="Pick the approved records of one stratum. Members whose record has a newer approved version are marked.">
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField label="Stratum" name="name" value={name} disabled={!canEdit} onChange={(e) => setName(e.target.value)} />
          <TextField label="Filter by borehole" name="borehole" value={borehole} onChange={(e) => setBorehole(e.target.value)} />
        </div>
        {records.isPending ? <LoadingBlock label="Loading the approved records…" /> : null}
        {records.error ? <ErrorMessage error={records.error} title="The approved records could not be loaded" /> : null}
        <div className="mt-3 overflow-x-auto rounded-md border border-slate-200">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Approved soil records of the project</caption>
            <TableHead cellClassName="px-3 py-2" headings={['In set', 'Record', 'Depth (m)', 'e0', 'Cc', 'Cr', 'Cs', 'σ′p (kPa)', 'OCR', 'cv (m²/yr)', 'Cα', 'Quality']} />
            <tbody>
              {listed.map((r) => {
                const label = `${r.boreholeName} ${r.sampleReference} (${r.testReference} v${r.version})`;
                return (
                  <tr key={r.versionId} className="border-t border-slate-100">
                    <td className="px-3 py-1.5">
                      <input
                        type="checkbox"
                        aria-label={`Include ${label}`}
                        disabled={!canEdit}
                        checked={versionIds.includes(r.versionId)}
                        onChange={(e) => setVersionIds((ids) => (e.target.checked ? [...ids, r.versionId] : ids.filter((id) => id !== r.versionId)))}
                      />
                    </td>
                    <td className="whitespace-nowrap px-3 py-1.5">{label}</td>
                    <td className="px-3 py-1.5">{r.depthM.toFixed(2)}</td>
                    {[r.e0, r.cc, r.cr, r.cs, r.preconsolidationKpa, r.ocr, r.cvMinM2PerYr, r.cAlpha].map((v, i) => (
                      <td key={i} className="px-3 py-1.5">
                        {formatNumber(v)}
                      </td>
                    ))}
                    <td className="px-3 py-1.5">{r.sampleQuality ?? '—'}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        {olderMembers.length > 0 ? <p className="mt-2 text-xs text-slate-600">{olderMembers.length} member{olderMembers.length === 1 ? ' is an older version' : 's are older versions'} of records listed above; untick and tick the record to take its newest version.</p> : null}
        {statistics.data?.members.some((m) => m.newerVersion !== null) ? (
          <Alert tone="warning" className="mt-3">
            Newer approved versions exist for {statistics.data.members.filter((m) => m.newerVersion !== null).map((m) => `${m.boreholeName} ${m.sampleReference} (v${m.version} → v${m.newerVersion})`).join(', ')}.
          </Alert>
        ) : null}
      </Panel>
      {versionIds.length === 0 ? null : statistics.error ? (
        <ErrorMessage error={statistics.error} title="The statistics could not be worked out" />
      ) : !statistics.data ? (
        <LoadingBlock label="Working out the statistics…" />
      ) : (
        <>
          <Panel title="Statistics and adopted values" description="n, mean, standard deviation, COV, the one-sided 95 % Student-t bound on the mean and Schneider's value, each on the side unfavourable for settlement.">
            <div className="overflow-x-auto">
              <table className="w-full text-left text-sm">
                <caption className="sr-only">Statistics of each parameter and the value adopted</caption>
                <TableHead cellClassName="px-2 py-2" headings={['Parameter', 'n', 'Mean', 'SD', 'COV', '95 % bound', 'Schneider', 'Unfavourable side', 'Adopt', 'Value', 'Note']} />
                <tbody>
                  {SET_PARAMETERS.map((parameter) => {
                    const stats = statsOf(parameter);
                    const adoption = adopted[parameter] ?? { basis: 'chosen' as AdoptionBasis, value: '', note: '' };
                    const label = SET_PARAMETER_LABELS[parameter];
                    const update = (next: Adoption) => setAdopted((all) => ({ ...all, [parameter]: next }));
                    return (
                      <tr key={parameter} className="border-t border-slate-100 align-top">
                        <th scope="row" className="whitespace-nowrap px-2 py-2 font-medium text-slate-900">
                          {label}
                        </th>
                        <td className="px-2 py-2">{stats?.count ?? 0}</td>
                        <td className="px-2 py-2">{formatNumber(stats?.mean)}</td>
                        <td className="px-2 py-2">{stats?.scale === 'log' ? `${formatNumber(stats.standardDeviation)} (log10)` : formatNumber(stats?.standardDeviation)}</td>
                        <td className="whitespace-nowrap px-2 py-2">{stats?.coefficientOfVariation == null ? '—' : `${(stats.coefficientOfVariation * 100).toFixed(0)} %`}</td>
                        <td className="px-2 py-2">{formatNumber(stats?.characteristicStudentT)}</td>
                        <td className="px-2 py-2">{formatNumber(stats?.characteristicSchneider)}</td>
                        <td className="max-w-56 px-2 py-2 text-xs text-slate-600">{stats?.unfavourableReason}</td>
                        <td className="px-2 py-2">
                          <select
                            aria-label={`How ${label} is adopted`}
                            disabled={!canEdit}
                            className="h-8 w-44 rounded-md border border-slate-300 bg-white px-2 text-sm"
                            value={adoption.basis}
                            onChange={(e) => {
                              const basis = e.target.value as AdoptionBasis;
                              update({ ...adoption, basis, value: basis === 'chosen' ? adoption.value : rounded(valueFor(basis, stats)) });
                            }}
                          >
                            {(Object.keys(BASIS_WORDS) as AdoptionBasis[]).map((b) => (
                              <option key={b} value={b}>
                                {BASIS_WORDS[b]}
                              </option>
                            ))}
                          </select>
                        </td>
                        <td className="px-2 py-2">
                          <input aria-label={`Adopted ${label}`} disabled={!canEdit} inputMode="decimal" className="h-8 w-24 rounded-md border border-slate-300 px-2 text-sm" value={adoption.value} onChange={(e) => update({ ...adoption, basis: 'chosen', value: e.target.value })} />
                        </td>
                        <td className="px-2 py-2">
                          <input aria-label={`Note on ${label}`} disabled={!canEdit} className="h-8 w-40 rounded-md border border-slate-300 px-2 text-sm" value={adoption.note} onChange={(e) => update({ ...adoption, note: e.target.value })} />
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
            <SetWarnings statistics={statistics.data.statistics} />
          </Panel>
          <Panel title="Against depth">
            <SetDepthPlots members={statistics.data.members} adopted={adoptedValues} />
          </Panel>
        </>
      )}
      {canEdit ? (
        <Panel title="Save">
          <div className="space-y-3">
            <TextField label="Note (kept with the revision)" name="note" value={note} onChange={(e) => setNote(e.target.value)} />
            {save.error ? <ErrorMessage error={save.error} title="The set was not saved" /> : null}
            <Button type="submit" pending={save.isPending} disabled={versionIds.length === 0}>
              {setId === null ? 'Save characteristic set' : 'Save as a new revision'}
            </Button>
          </div>
        </Panel>
      ) : null}
    </form>
  );
}

/** The statistics' warnings, each said once with the parameters it concerns. */
function SetWarnings({ statistics }: { statistics: readonly ParameterStatistics[] }) {
  const byMessage = new Map<string, string[]>();
  for (const s of statistics) for (const w of s.warnings) byMessage.set(w, [...(byMessage.get(w) ?? []), SET_PARAMETER_LABELS[s.parameter]]);
  if (byMessage.size === 0) return null;
  return (
    <ul className="mt-3 list-disc space-y-0.5 pl-5 text-xs text-amber-900">
      {[...byMessage].map(([message, parameters]) => (
        <li key={message}>
          {parameters.join(', ')}: {message}
        </li>
      ))}
    </ul>
  );
}
