import type { GroundModelDetail, GroundModelPreview } from '@porestack/types';
import { useEffect, useMemo, useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Panel } from '../../../components/panel';
import { TextField } from '../../../components/text-field';
import { ApiError, messageOf } from '../../../lib/api-error';
import { useCharacteristicSets } from '../api/characteristic-sets';
import { useDesignRecords } from '../api/design-records';
import { previewGroundModel, useSaveGroundModel } from '../api/ground-models';
import { emptyLayer, modelInput, type ModelDraft } from './ground-model-draft';
import { GroundProfilePlot } from './ground-profile-plot';
import { LayerFields } from './layer-fields';

type GroundModelEditorProps = {
  orgId: string;
  projectId: string;
  /** null: a new ground model. */
  modelId: string | null;
  initial: ModelDraft;
  onSaved: (model: GroundModelDetail) => void;
};

type Issue = { path: string; message: string };

/** Issues of one layer, keyed by the field path inside it. */
function layerIssues(issues: readonly Issue[], index: number): Map<string, string> {
  const prefix = `layers.${index}.`;
  return new Map(issues.filter((i) => i.path.startsWith(prefix)).map((i) => [i.path.slice(prefix.length), i.message]));
}

/**
 * Builds or revises a ground model: its level, water table and γw, then the layers from the top
 * down. Each clay takes its parameters from an approved soil record, a characteristic set or hand
 * entries; the server resolves them as the designer types (the drawing follows), and saving makes
 * a new revision — unusual values must be confirmed first.
 */
export function GroundModelEditor({ orgId, projectId, modelId, initial, onSaved }: GroundModelEditorProps) {
  const [draft, setDraft] = useState<ModelDraft>(initial);
  const [preview, setPreview] = useState<GroundModelPreview | null>(null);
  const [previewError, setPreviewError] = useState<unknown>(null);
  const [warningsToConfirm, setWarningsToConfirm] = useState<Issue[] | null>(null);
  const records = useDesignRecords(orgId, projectId);
  const sets = useCharacteristicSets(orgId, projectId);
  const save = useSaveGroundModel(orgId, projectId, modelId);
  const input = useMemo(() => modelInput(draft), [draft]);

  useEffect(() => {
    let cancelled = false;
    const timer = setTimeout(() => {
      previewGroundModel(orgId, projectId, input).then(
        (answer) => {
          if (cancelled) return;
          setPreview(answer);
          setPreviewError(null);
        },
        (error: unknown) => {
          if (!cancelled) setPreviewError(error);
        },
      );
    }, 400);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [orgId, projectId, input]);

  const saveError = save.error instanceof ApiError && save.error.code !== 'confirmation_needed' ? save.error : null;
  const issues: Issue[] = [
    ...(saveError?.issues ?? []),
    ...(previewError instanceof ApiError ? previewError.issues : []),
    ...(previewError === null && preview ? [...preview.errors, ...preview.warnings] : []),
  ];
  const issueFor = (path: string) => issues.find((i) => i.path === path)?.message;

  const submit = (acceptWarnings: boolean) =>
    save.mutate(
      { ...input, acceptWarnings },
      {
        onSuccess: (model) => {
          setWarningsToConfirm(null);
          onSaved(model);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.code === 'confirmation_needed') setWarningsToConfirm([...error.issues]);
        },
      },
    );
  const updateLayer = (index: number, layer: ModelDraft['layers'][number]) => setDraft((d) => ({ ...d, layers: d.layers.map((l, i) => (i === index ? layer : l)) }));
  const moveLayer = (index: number, direction: -1 | 1) =>
    setDraft((d) => {
      const layers = [...d.layers];
      const [moved] = layers.splice(index, 1);
      if (moved) layers.splice(index + direction, 0, moved);
      return { ...d, layers };
    });

  return (
    <form
      aria-label="Ground model"
      className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]"
      onSubmit={(event) => {
        event.preventDefault();
        submit(false);
      }}
    >
      <div className="space-y-4">
        <Panel title="Site">
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField label="Ground model name" name="name" value={draft.name} onChange={(e) => setDraft({ ...draft, name: e.target.value })} error={issueFor('name')} className="sm:col-span-2" />
            <TextField label="Ground level (m)" name="groundLevelM" inputMode="decimal" value={draft.groundLevelM} onChange={(e) => setDraft({ ...draft, groundLevelM: e.target.value })} error={issueFor('groundLevelM')} hint="reported only; depths are below it" />
            <TextField label="Water table depth (m)" name="waterTableDepthM" inputMode="decimal" value={draft.waterTableDepthM} onChange={(e) => setDraft({ ...draft, waterTableDepthM: e.target.value })} error={issueFor('waterTableDepthM')} />
            <TextField
              label="γw (kN/m³)"
              name="waterUnitWeightKnPerM3"
              inputMode="decimal"
              value={draft.waterUnitWeightKnPerM3}
              onChange={(e) => setDraft({ ...draft, waterUnitWeightKnPerM3: e.target.value })}
              error={issueFor('waterUnitWeightKnPerM3')}
              hint="9.81 by default; some references use 10"
            />
          </div>
        </Panel>
        {records.error ? <ErrorMessage error={records.error} title="The approved soil records could not be loaded" /> : null}
        {draft.layers.map((layer, index) => (
          <LayerFields
            key={layer.key}
            index={index}
            count={draft.layers.length}
            layer={layer}
            resolved={preview?.content.layers[index]}
            records={records.data ?? []}
            sets={sets.data ?? []}
            issues={layerIssues(issues, index)}
            onChange={(next) => updateLayer(index, next)}
            onMove={(direction) => moveLayer(index, direction)}
            onRemove={() => setDraft((d) => ({ ...d, layers: d.layers.filter((_, i) => i !== index) }))}
          />
        ))}
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" size="sm" onClick={() => setDraft((d) => ({ ...d, layers: [...d.layers, emptyLayer('compressible')] }))}>
            Add a compressible layer
          </Button>
          <Button variant="secondary" size="sm" onClick={() => setDraft((d) => ({ ...d, layers: [...d.layers, emptyLayer('granular')] }))}>
            Add a granular layer
          </Button>
        </div>
        <Panel title="Save">
          <div className="space-y-3">
            <TextField label="What changed (kept with the revision)" name="note" value={draft.note} onChange={(e) => setDraft({ ...draft, note: e.target.value })} />
            {warningsToConfirm ? (
              <Alert tone="warning" title="Check these values before saving">
                <ul className="list-disc space-y-0.5 pl-5">
                  {warningsToConfirm.map((w) => (
                    <li key={w.path + w.message}>{w.message}</li>
                  ))}
                </ul>
                <Button className="mt-3" variant="secondary" size="sm" pending={save.isPending} onClick={() => submit(true)}>
                  Save anyway
                </Button>
              </Alert>
            ) : null}
            {saveError ? <ErrorMessage error={saveError} title="The ground model was not saved" /> : null}
            <Button type="submit" pending={save.isPending}>
              {modelId === null ? 'Save ground model' : 'Save as a new revision'}
            </Button>
          </div>
        </Panel>
      </div>
      <div className="space-y-3 lg:sticky lg:top-4">
        <Panel title="Profile" description="Layers to scale with the water table; stresses and the σ′p the check will use, with the samples at their depths.">
          {preview?.profile ? (
            <GroundProfilePlot content={preview.content} profile={preview.profile} />
          ) : (
            <p className="text-sm text-slate-600">{previewError ? messageOf(previewError) : preview ? 'The drawing appears once the errors listed are put right.' : 'Drawing the profile…'}</p>
          )}
        </Panel>
        {preview && (preview.errors.length > 0 || preview.warnings.length > 0) ? (
          <Alert tone={preview.errors.length > 0 ? 'error' : 'warning'} title={preview.errors.length > 0 ? 'To put right before saving' : 'Worth a second look'}>
            <ul className="list-disc space-y-0.5 pl-5">
              {[...preview.errors, ...preview.warnings].map((i) => (
                <li key={i.path + i.message}>{i.message}</li>
              ))}
            </ul>
          </Alert>
        ) : null}
        {preview?.profile && preview.profile.warnings.length > 0 ? (
          <Alert tone="info" title="How σ′p is carried">
            <ul className="list-disc space-y-0.5 pl-5">
              {preview.profile.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          </Alert>
        ) : null}
      </div>
    </form>
  );
}
