import { ProjectCreateSchema, type ProjectDetail } from '@porestack/types';
import { useState } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateProject } from '../api/create-project';
import { DesignerPicker } from './designer-picker';

export function ProjectCreateForm({ orgId, onCreated, onCancel }: { orgId: string; onCreated: (project: ProjectDetail) => void; onCancel: () => void }) {
  const create = useCreateProject(orgId);
  const [designerIds, setDesignerIds] = useState<string[]>([]);
  const { errors, onSubmit } = useSchemaForm(ProjectCreateSchema, {
    toValues: (values) => ({ ...values, designerIds }),
    serverError: create.error,
    onValid: (project) => create.mutate(project, { onSuccess: onCreated }),
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New project" className="grid gap-4 sm:grid-cols-2">
      <TextField label="Project name" name="name" autoFocus error={errors['name']} />
      <TextField label="Reference" name="reference" hint="Your job number, e.g. PS-2031" error={errors['reference']} />
      <TextField label="Client" name="clientName" error={errors['clientName']} />
      <TextField label="Site" name="siteName" error={errors['siteName']} />
      <div className="sm:col-span-2">
        <DesignerPicker orgId={orgId} value={designerIds} onChange={setDesignerIds} error={errors['designerIds']} />
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
