import { BoreholeCreateSchema } from '@porestack/types';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { numberOrNull } from '../../../lib/form-numbers';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateBorehole } from '../api/create-borehole';

export function BoreholeCreateForm({ orgId, projectId, onDone }: { orgId: string; projectId: string; onDone: () => void }) {
  const create = useCreateBorehole(orgId, projectId);
  const { errors, onSubmit } = useSchemaForm(BoreholeCreateSchema, {
    toValues: (values) => ({
      name: values['name'],
      groundLevelMOd: numberOrNull(values['groundLevelMOd']),
      waterTableDepthM: numberOrNull(values['waterTableDepthM']),
    }),
    serverError: create.error,
    onValid: (borehole) => create.mutate(borehole, { onSuccess: onDone }),
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New borehole" className="grid gap-4 sm:grid-cols-3">
      <TextField label="Borehole name" name="name" autoFocus hint="e.g. BH-04" error={errors['name']} />
      <TextField label="Ground level (m OD)" name="groundLevelMOd" inputMode="decimal" error={errors['groundLevelMOd']} />
      <TextField label="Water table depth (m)" name="waterTableDepthM" inputMode="decimal" hint="Leave blank if none was met" error={errors['waterTableDepthM']} />
      {create.error ? <div className="sm:col-span-3"><ErrorMessage error={create.error} hideIssuesFor={['name', 'groundLevelMOd', 'waterTableDepthM']} /></div> : null}
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" pending={create.isPending}>Add borehole</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
