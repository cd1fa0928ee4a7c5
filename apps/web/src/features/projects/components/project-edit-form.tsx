import { ProjectUpdateSchema, type ProjectDetail } from '@porestack/types';
import { useState } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useUpdateProject } from '../api/update-project';
import { DesignerPicker } from './designer-picker';

/** The project's name, reference, client, site and designers, as a lab manager keeps them. */
export function ProjectEditForm({ orgId, project, onDone }: { orgId: string; project: ProjectDetail; onDone: () => void }) {
  const update = useUpdateProject(orgId, project.id);
  const [designerIds, setDesignerIds] = useState<string[]>(project.designers.map((d) => d.userId));
  const { errors, onSubmit } = useSchemaForm(ProjectUpdateSchema, {
    toValues: (values) => ({ ...values, designerIds }),
    serverError: update.error,
    onValid: (changes) => update.mutate(changes, { onSuccess: onDone }),
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Edit project" className="grid gap-4 sm:grid-cols-2">
      <TextField label="Project name" name="name" defaultValue={project.name} autoFocus error={errors['name']} />
      <TextField label="Reference" name="reference" defaultValue={project.reference} error={errors['reference']} />
      <TextField label="Client" name="clientName" defaultValue={project.clientName} error={errors['clientName']} />
      <TextField label="Site" name="siteName" defaultValue={project.siteName} error={errors['siteName']} />
      <div className="sm:col-span-2">
        <DesignerPicker orgId={orgId} value={designerIds} onChange={setDesignerIds} error={errors['designerIds']} />
      </div>
      {update.error ? (
        <div className="sm:col-span-2">
          <ErrorMessage error={update.error} hideIssuesFor={['name', 'reference', 'clientName', 'siteName', 'designerIds']} />
        </div>
      ) : null}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" pending={update.isPending}>Save project</Button>
        <Button variant="ghost" onClick={onDone}>Cancel</Button>
      </div>
    </form>
  );
}
