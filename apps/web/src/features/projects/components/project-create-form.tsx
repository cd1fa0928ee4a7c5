import { ProjectCreateSchema, type ProjectDetail } from '@porestack/types';
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromApi, focusFirstInvalid, formValues, validate, type FieldErrors } from '../../../lib/form-errors';
import { useCreateProject } from '../api/create-project';
import { DesignerPicker } from './designer-picker';

export function ProjectCreateForm({ orgId, onCreated, onCancel }: { orgId: string; onCreated: (project: ProjectDetail) => void; onCancel: () => void }) {
  const create = useCreateProject(orgId);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [designerIds, setDesignerIds] = useState<string[]>([]);
  const shown = { ...fieldErrorsFromApi(create.error), ...errors };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = validate(ProjectCreateSchema, { ...formValues(event.currentTarget), designerIds });
    if (!result.ok) {
      setErrors(result.errors);
      focusFirstInvalid(event.currentTarget, result.errors);
      return;
    }
    setErrors({});
    create.mutate(result.data, { onSuccess: onCreated });
  };

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New project" className="grid gap-4 sm:grid-cols-2">
      <TextField label="Project name" name="name" autoFocus error={shown['name']} />
      <TextField label="Reference" name="reference" hint="Your job number, e.g. PS-2031" error={shown['reference']} />
      <TextField label="Client" name="clientName" error={shown['clientName']} />
      <TextField label="Site" name="siteName" error={shown['siteName']} />
      <div className="sm:col-span-2">
        <DesignerPicker orgId={orgId} value={designerIds} onChange={setDesignerIds} error={shown['designerIds']} />
      </div>
      {create.error ? (
        <div className="sm:col-span-2">
          <ErrorMessage error={create.error} hideIssuesFor={['name', 'reference', 'clientName', 'siteName', 'designerIds']} />
        </div>
      ) : null}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" pending={create.isPending}>Create project</Button>
        <Button variant="ghost" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
