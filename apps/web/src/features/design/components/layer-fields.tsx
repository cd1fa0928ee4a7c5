import type { CharacteristicSetSummary, DesignRecord, GroundModelLayer } from '@porestack/types';
import { useId, useState } from 'react';
import { Button } from '../../../components/button';
import { controlClasses } from '../../../components/field-parts';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { formatNumber } from './design-format';
import { PARAMETER_LABELS, PARAMETER_NAMES, type LayerDraft, type ParameterName } from './ground-model-draft';

type LayerFieldsProps = {
  index: number;
  count: number;
  layer: LayerDraft;
  /** The layer as the server resolved it in the last preview (values from its source). */
  resolved: GroundModelLayer | undefined;
  records: readonly DesignRecord[];
  sets: readonly CharacteristicSetSummary[];
  /** Messages by field path inside the layer ('thicknessM', 'parameters', …). */
  issues: ReadonlyMap<string, string>;
  onChange: (layer: LayerDraft) => void;
  onMove: (direction: -1 | 1) => void;
  onRemove: () => void;
};

const recordLabel = (r: DesignRecord) =>
  `${r.boreholeName} ${r.sampleReference} at ${r.depthM.toFixed(2)} m — ${r.testReference} v${r.version}: e0 ${formatNumber(r.e0)}, Cc ${formatNumber(r.cc)}, σ′p ${formatNumber(r.preconsolidationKpa)} kPa`;

/** One layer of the ground model: its geometry and weights, and for a clay where its parameters come from. */
export function LayerFields({ index, count, layer, resolved, records, sets, issues, onChange, onMove, onRemove }: LayerFieldsProps) {
  const set = <K extends keyof LayerDraft>(key: K, value: LayerDraft[K]) => onChange({ ...layer, [key]: value });
  const label = `Layer ${index + 1}`;
  return (
    <fieldset className="rounded-md border border-slate-200 bg-white p-4" aria-label={label}>
      <legend className="px-1 text-sm font-semibold text-slate-900">
        {label}
        {layer.name ? ` — ${layer.name}` : ''}
      </legend>
      <div className="flex flex-wrap items-start gap-3">
        <TextField label="Name" name="name" value={layer.name} onChange={(e) => set('name', e.target.value)} error={issues.get('name')} className="w-full sm:w-56" />
        <Select
          className="w-full sm:w-60"
          label="Kind"
          value={layer.kind}
          onChange={(e) => set('kind', e.target.value as LayerDraft['kind'])}
          options={[
            { value: 'granular', label: 'granular (settles at once)' },
            { value: 'compressible', label: 'compressible (consolidates)' },
          ]}
        />
        <TextField label="Thickness (m)" name="thicknessM" className="w-32" inputMode="decimal" value={layer.thicknessM} onChange={(e) => set('thicknessM', e.target.value)} error={issues.get('thicknessM')} />
        <TextField label="γ above water (kN/m³)" name="unitWeightKnPerM3" className="w-40" inputMode="decimal" value={layer.unitWeightKnPerM3} onChange={(e) => set('unitWeightKnPerM3', e.target.value)} error={issues.get('unitWeightKnPerM3')} />
        <TextField
          label="γ below water (kN/m³)"
          name="saturatedUnitWeightKnPerM3"
          className="w-40"
          inputMode="decimal"
          value={layer.saturatedUnitWeightKnPerM3}
          onChange={(e) => set('saturatedUnitWeightKnPerM3', e.target.value)}
          error={issues.get('saturatedUnitWeightKnPerM3')}
        />
        <TextField label="E′ (kPa)" name="elasticModulusKpa" className="w-32" inputMode="decimal" value={layer.elasticModulusKpa} onChange={(e) => set('elasticModulusKpa', e.target.value)} error={issues.get('elasticModulusKpa')} hint="for immediate settlement" />
        <TextField label="ν" name="poissonRatio" className="w-32" inputMode="decimal" value={layer.poissonRatio} onChange={(e) => set('poissonRatio', e.target.value)} error={issues.get('poissonRatio')} />
        {layer.kind === 'compressible' ? (
          <>
            <Select className="w-40" label="Drainage at the top" value={layer.drainageTop} onChange={(e) => set('drainageTop', e.target.value as LayerDraft['drainageTop'])} options={DRAINAGE} />
            <Select className="w-40" label="Drainage at the bottom" value={layer.drainageBottom} onChange={(e) => set('drainageBottom', e.target.value as LayerDraft['drainageBottom'])} options={DRAINAGE} />
          </>
        ) : null}
      </div>
      {layer.kind === 'compressible' ? <CompressibleFields layer={layer} resolved={resolved} records={records} sets={sets} issues={issues} onChange={onChange} /> : null}
      <div className="mt-3 flex gap-2">
        <Button variant="ghost" size="sm" disabled={index === 0} onClick={() => onMove(-1)} aria-label={`Move ${label} up`}>
          ↑ Up
        </Button>
        <Button variant="ghost" size="sm" disabled={index === count - 1} onClick={() => onMove(1)} aria-label={`Move ${label} down`}>
          ↓ Down
        </Button>
        <Button variant="ghost-danger" size="sm" disabled={count === 1} onClick={onRemove} aria-label={`Remove ${label}`}>
          Remove
        </Button>
      </div>
    </fieldset>
  );
}

const DRAINAGE = [
  { value: 'free', label: 'free-draining' },
  { value: 'impermeable', label: 'impermeable' },
];

function CompressibleFields({ layer, resolved, records, sets, issues, onChange }: Omit<LayerFieldsProps, 'index' | 'count' | 'onMove' | 'onRemove'>) {
  const [borehole, setBorehole] = useState('');
  const [fromM, setFromM] = useState('');
  const [toM, setToM] = useState('');
  const set = <K extends keyof LayerDraft>(key: K, value: LayerDraft[K]) => onChange({ ...layer, [key]: value });
  const filtered = records.filter(
    (r) => (borehole === '' || r.boreholeName.toLowerCase().includes(borehole.toLowerCase())) && (fromM === '' || r.depthM >= Number(fromM)) && (toM === '' || r.depthM <= Number(toM)),
  );
  const chosen = records.find((r) => r.versionId === layer.versionId);
  const options = chosen && !filtered.includes(chosen) ? [chosen, ...filtered] : filtered;
  const p = resolved?.parameters ?? null;
  return (
    <div className="mt-4 space-y-3 border-t border-slate-100 pt-3">
      <div role="radiogroup" aria-label="Where the parameters come from" className="flex flex-wrap gap-4 text-sm">
        {(
          [
            ['record', 'an approved soil record'],
            ['set', 'a characteristic set'],
            ['hand', 'entered by hand'],
          ] as const
        ).map(([value, words]) => (
          <label key={value} className="flex items-center gap-2">
            <input type="radio" name={`${layer.key}-source`} checked={layer.sourceKind === value} onChange={() => set('sourceKind', value)} />
            {words}
          </label>
        ))}
      </div>
      {layer.sourceKind === 'record' ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="Borehole contains" name="borehole" value={borehole} onChange={(e) => setBorehole(e.target.value)} />
          <TextField label="Depth from (m)" name="fromM" inputMode="decimal" value={fromM} onChange={(e) => setFromM(e.target.value)} />
          <TextField label="Depth to (m)" name="toM" inputMode="decimal" value={toM} onChange={(e) => setToM(e.target.value)} />
          <Select
            className="sm:col-span-3"
            label="Approved soil record"
            value={layer.versionId}
            error={issues.get('source')}
            onChange={(e) => {
              const record = records.find((r) => r.versionId === e.target.value);
              onChange({ ...layer, versionId: record?.versionId ?? '', recordId: record?.recordId ?? '' });
            }}
            options={[{ value: '', label: options.length === 0 ? 'No approved record matches' : 'Choose a record…' }, ...options.map((r) => ({ value: r.versionId, label: recordLabel(r) }))]}
          />
        </div>
      ) : null}
      {layer.sourceKind === 'set' ? (
        <Select
          label="Characteristic set"
          value={layer.setRevisionId}
          error={issues.get('source')}
          onChange={(e) => {
            const chosenSet = sets.find((s) => s.currentRevisionId === e.target.value);
            onChange({ ...layer, setRevisionId: chosenSet?.currentRevisionId ?? e.target.value, setId: chosenSet?.id ?? layer.setId });
          }}
          options={[
            { value: '', label: sets.length === 0 ? 'No characteristic set in this project yet' : 'Choose a set…' },
            ...(layer.setRevisionId !== '' && !sets.some((s) => s.currentRevisionId === layer.setRevisionId) ? [{ value: layer.setRevisionId, label: 'an earlier revision of a set (choose again for the newest)' }] : []),
            ...sets.map((s) => ({ value: s.currentRevisionId, label: `${s.name} (revision ${s.currentRevision}, ${s.memberCount} records)` })),
          ]}
        />
      ) : null}
      {issues.get('parameters') ? <p className="text-sm text-red-700">{issues.get('parameters')}</p> : null}
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4 lg:grid-cols-7">
        {PARAMETER_NAMES.map((name) => (
          <ParameterField key={name} layer={layer} name={name} resolvedValue={p ? resolvedValue(p, name) : null} onChange={onChange} error={issues.get(`parameters.${name}`)} />
        ))}
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <Select
          label="Recompression index used"
          value={layer.recompressionIndexKind}
          onChange={(e) => set('recompressionIndexKind', e.target.value as LayerDraft['recompressionIndexKind'])}
          hint={p?.recompressionIndex.kind ? `Using ${p.recompressionIndex.kind}${layer.recompressionIndexKind === '' ? ' (Cr where the test measured one, otherwise Cs)' : ''}.` : undefined}
          options={[
            { value: '', label: 'Cr where measured, else Cs' },
            { value: 'Cr', label: 'Cr (reload branch)' },
            { value: 'Cs', label: 'Cs (unload branch)' },
          ]}
        />
        <Select
          label="σ′p carried through the layer by"
          value={layer.preconsolidationCarry}
          onChange={(e) => set('preconsolidationCarry', e.target.value as LayerDraft['preconsolidationCarry'])}
          hint={
            layer.preconsolidationCarry === 'ocr'
              ? `OCR = σ′p/σ′v0 kept constant${p?.preconsolidationDepthM != null ? ` (from σ′p at ${p.preconsolidationDepthM.toFixed(2)} m)` : ''}.`
              : layer.preconsolidationCarry === 'pop'
                ? `σ′p − σ′v0 (POP) kept constant${p?.preconsolidationDepthM != null ? ` (from σ′p at ${p.preconsolidationDepthM.toFixed(2)} m)` : ''}: σ′p runs parallel to σ′v0.`
                : 'σ′p kept the same at every depth of the layer.'
          }
          options={[
            { value: 'ocr', label: 'a constant OCR' },
            { value: 'pop', label: 'a constant σ′p − σ′v0 (POP)' },
            { value: 'constant', label: 'a constant σ′p' },
          ]}
        />
        {layer.sourceKind === 'hand' || layer.entered.includes('preconsolidationKpa') ? (
          <TextField label="σ′p given at depth (m)" name="preconsolidationDepthM" inputMode="decimal" value={layer.preconsolidationDepthM} onChange={(e) => set('preconsolidationDepthM', e.target.value)} hint="Left empty: the layer's mid-depth." />
        ) : null}
      </div>
      {layer.sourceKind === 'record' && !layer.entered.includes('cvM2PerYr') ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <Select
            label="cv taken as"
            value={layer.cvBasis}
            onChange={(e) => set('cvBasis', e.target.value as LayerDraft['cvBasis'])}
            options={[
              { value: 'lowest', label: "the lowest of the test's increments" },
              { value: 'design-range', label: 'cv over the design stress range' },
            ]}
          />
          {layer.cvBasis === 'design-range' ? (
            <TextField
              label="Final effective stress σ′f (kPa)"
              name="cvFinalStressKpa"
              inputMode="decimal"
              value={layer.cvFinalStressKpa}
              onChange={(e) => set('cvFinalStressKpa', e.target.value)}
              error={issues.get('parameters.cvFinalStressKpa')}
              hint="σ′v0 + Δσ′ at the layer's mid-depth under the load"
            />
          ) : null}
        </div>
      ) : null}
      {p ? <p className="text-xs text-slate-500">cv: {p.cvM2PerYr.basis}.</p> : null}
    </div>
  );
}

function resolvedValue(p: NonNullable<GroundModelLayer['parameters']>, name: ParameterName): number | null {
  return p[name].value;
}

/** A parameter shown from its source, or typed over it (then marked "entered by hand", with a way back). */
function ParameterField({ layer, name, resolvedValue, onChange, error }: { layer: LayerDraft; name: ParameterName; resolvedValue: number | null; onChange: (layer: LayerDraft) => void; error: string | undefined }) {
  const id = useId();
  const hand = layer.sourceKind === 'hand';
  const typed = hand || layer.entered.includes(name);
  const shown = typed ? layer.values[name] : resolvedValue === null ? '' : String(Number(resolvedValue.toPrecision(4)));
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-slate-800">
        {PARAMETER_LABELS[name]}
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={shown}
        placeholder={typed ? '' : 'none in source'}
        aria-invalid={error ? true : undefined}
        className={`${controlClasses(Boolean(error))} h-9 ${typed && !hand ? 'bg-amber-50' : ''}`}
        onChange={(e) => onChange({ ...layer, values: { ...layer.values, [name]: e.target.value }, entered: typed ? layer.entered : [...layer.entered, name] })}
      />
      <span className="text-xs text-slate-500">
        {hand ? 'entered by hand' : typed ? (
          <>
            entered by hand ·{' '}
            <button type="button" className="text-accent-700 hover:underline" onClick={() => onChange({ ...layer, entered: layer.entered.filter((n) => n !== name) })}>
              use the {layer.sourceKind === 'set' ? 'set' : 'record'}'s
            </button>
          </>
        ) : (
          `from the ${layer.sourceKind === 'set' ? 'set' : 'record'}`
        )}
      </span>
      {error ? <span className="text-sm text-red-700">{error}</span> : null}
    </div>
  );
}
