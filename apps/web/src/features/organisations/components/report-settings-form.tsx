import { ReportSettingsSchema, type ReportSettingsView } from '@porestack/types';
import { useId, useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { controlClasses, describedBy, FieldError, FieldHint } from '../../../components/field-parts';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useUpdateReportSettings } from '../api/report-settings';

function TextArea({ label, name, defaultValue, hint, error, rows }: { label: string; name: string; defaultValue: string; hint: string; error: string | undefined; rows: number }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-slate-800">{label}</label>
      <textarea id={id} name={name} rows={rows} defaultValue={defaultValue} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, hint, error)} className={`${controlClasses(Boolean(error))} py-2`} />
      <FieldHint id={id}>{hint}</FieldHint>
      <FieldError id={id} message={error} />
    </div>
  );
}

/** The address and method statement printed on the laboratory's reports from now on. */
export function ReportSettingsForm({ orgId, settings }: { orgId: string; settings: ReportSettingsView }) {
  const update = useUpdateReportSettings(orgId);
  const [saved, setSaved] = useState(false);
  const { errors, onSubmit } = useSchemaForm(ReportSettingsSchema, {
    serverError: update.error,
    toValues: (values) => ({ address: values['address'] ?? '', testMethodStatement: (values['testMethodStatement'] ?? '').trim() || null }),
    onValid: (data) => {
      setSaved(false);
      update.mutate(data, { onSuccess: () => setSaved(true) });
    },
  });
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="What reports print">
      <TextArea label="Address and contact lines" name="address" rows={3} defaultValue={settings.address} hint={`Printed under “${settings.organisationName}” at the top of every report.`} error={errors['address']} />
      <TextArea
        label="Test method statement"
        name="testMethodStatement"
        rows={3}
        defaultValue={settings.testMethodStatement ?? ''}
        hint={`Leave empty to print: “${settings.defaultTestMethodStatement}”`}
        error={errors['testMethodStatement']}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" pending={update.isPending}>Save what reports print</Button>
        <p className="text-xs text-slate-500">Reports already issued keep what they printed.</p>
      </div>
      {update.error ? <ErrorMessage error={update.error} hideIssuesFor={['address', 'testMethodStatement']} /> : null}
      {saved ? <Alert tone="success">Saved. Reports printed from now on use these lines.</Alert> : null}
    </form>
  );
}
