import { TestCreateSchema, type TestDetail } from '@porestack/types';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { numberOrUndefined } from '../../../lib/form-numbers';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateTest } from '../api/create-test';

const DRAINAGE_OPTIONS = [
  { value: 'double', label: 'Both ends (double)' },
  { value: 'single', label: 'One end (single)' },
];

/** Starts a test with the ring most labs use (75 mm × 20 mm) and a typical Gs; all can be changed later. */
export function TestCreateForm({ orgId, sampleId, sampleReference, onCreated, onCancel }: { orgId: string; sampleId: string; sampleReference: string; onCreated: (test: TestDetail) => void; onCancel: () => void }) {
  const create = useCreateTest(orgId, sampleId);
  const { errors, onSubmit } = useSchemaForm(TestCreateSchema, {
    toValues: (values) => ({
      reference: values['reference'],
      apparatusName: values['apparatusName'],
      specimen: {
        initialHeightMm: numberOrUndefined(values['initialHeightMm']),
        diameterMm: numberOrUndefined(values['diameterMm']),
        specificGravity: numberOrUndefined(values['specificGravity']),
        drainage: values['drainage'],
      },
    }),
    serverError: create.error,
    onValid: (test) => create.mutate(test, { onSuccess: onCreated }),
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label={`New test on ${sampleReference}`} className="grid gap-4 sm:grid-cols-3">
      <TextField label="Test reference" name="reference" autoFocus defaultValue={`${sampleReference}-OED`} error={errors['reference']} />
      <TextField label="Apparatus" name="apparatusName" hint="Frame or cell name" error={errors['apparatusName']} />
      <Select label="Drainage" name="drainage" options={DRAINAGE_OPTIONS} defaultValue="double" />
      <TextField label="Ring height H0 (mm)" name="initialHeightMm" inputMode="decimal" defaultValue="20" error={errors['specimen']} />
      <TextField label="Ring diameter (mm)" name="diameterMm" inputMode="decimal" defaultValue="75" />
      <TextField label="Specific gravity Gs" name="specificGravity" inputMode="decimal" defaultValue="2.70" />
      {create.error ? <div className="sm:col-span-3"><ErrorMessage error={create.error} hideIssuesFor={['reference']} /></div> : null}
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" pending={create.isPending}>Create test</Button>
        <Button variant="ghost" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
