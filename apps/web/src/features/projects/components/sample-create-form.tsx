import { SampleCreateSchema } from '@porestack/types';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { numberOrNull } from '../../../lib/form-numbers';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateSample } from '../api/create-sample';

const FIELDS = ['reference', 'topDepthM', 'bottomDepthM', 'description', 'bulkUnitWeightKnPerM3', 'inSituStressKpa'];

export function SampleCreateForm({ orgId, projectId, boreholeId, onDone }: { orgId: string; projectId: string; boreholeId: string; onDone: () => void }) {
  const create = useCreateSample(orgId, boreholeId, projectId);
  const { errors, onSubmit } = useSchemaForm(SampleCreateSchema, {
    toValues: (values) => ({
      reference: values['reference'],
      topDepthM: numberOrNull(values['topDepthM']) ?? undefined,
      bottomDepthM: numberOrNull(values['bottomDepthM']) ?? undefined,
      description: values['description'],
      bulkUnitWeightKnPerM3: numberOrNull(values['bulkUnitWeightKnPerM3']),
      inSituStressKpa: numberOrNull(values['inSituStressKpa']),
    }),
    serverError: create.error,
    onValid: (sample) => create.mutate(sample, { onSuccess: onDone }),
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New sample" className="grid gap-4 sm:grid-cols-3">
      <TextField label="Sample reference" name="reference" autoFocus hint="e.g. U-3" error={errors['reference']} />
      <TextField label="Top depth (m)" name="topDepthM" inputMode="decimal" error={errors['topDepthM']} />
      <TextField label="Bottom depth (m)" name="bottomDepthM" inputMode="decimal" error={errors['bottomDepthM']} />
      <TextField label="Description" name="description" className="sm:col-span-3" hint="e.g. Soft grey silty CLAY" error={errors['description']} />
      <TextField label="Bulk unit weight above (kN/m³)" name="bulkUnitWeightKnPerM3" inputMode="decimal" defaultValue="18" hint="Used to estimate σ′v0 when it is not entered" error={errors['bulkUnitWeightKnPerM3']} />
      <TextField label="In-situ σ′v0 (kPa)" name="inSituStressKpa" inputMode="decimal" hint="Leave blank to estimate it" error={errors['inSituStressKpa']} />
      {create.error ? <div className="sm:col-span-3"><ErrorMessage error={create.error} hideIssuesFor={FIELDS} /></div> : null}
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" pending={create.isPending}>Add sample</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
