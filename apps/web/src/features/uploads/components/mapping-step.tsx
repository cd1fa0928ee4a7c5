import type { CsvDelimiter, ImportRequest } from '@porestack/types';
import { useState } from 'react';
import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { useUploadPreview, type PreviewChoice } from '../api/get-upload-preview';
import { MappingForm } from './mapping-form';

type MappingStepProps = {
  orgId: string;
  uploadId: string;
  fileName: string;
  /** A file already imported or rejected, mapped again from storage. */
  again: boolean;
  specimenHeightMm: number | null;
  pending: boolean;
  error: unknown;
  onImport: (request: ImportRequest) => void;
  onCancel?: (() => void) | undefined;
};

/**
 * The stored file's first rows and the mapping form. Choosing another header row or delimiter
 * reads the preview again at once; the form then starts over from what that row's names
 * suggest (the previous rows stay shown while it reads).
 */
export function MappingStep({ orgId, uploadId, fileName, again, specimenHeightMm, pending, error, onImport, onCancel }: MappingStepProps) {
  const [choice, setChoice] = useState<PreviewChoice>({});
  const preview = useUploadPreview(orgId, uploadId, choice);
  if (preview.isPending) return <LoadingBlock label="Reading the first rows…" />;
  if (preview.error && !preview.data) return <ErrorMessage error={preview.error} title="The file's first rows could not be read" onRetry={() => void preview.refetch()} />;
  const data = preview.data;
  if (!data) return null;
  return (
    <section aria-label="Map the columns" className="space-y-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-sm font-semibold text-slate-900">
          {again ? `Map ${fileName} again — the stored file is read anew, nothing is uploaded` : 'This file is not in the standard layout: confirm which column holds what'}
        </h3>
        {onCancel ? (
          <button type="button" className="text-sm font-medium text-accent-700 hover:underline" onClick={onCancel}>Close without importing</button>
        ) : null}
      </div>
      {preview.error ? <ErrorMessage error={preview.error} title="That row could not be read" /> : null}
      <MappingForm
        key={`${data.headerRow}|${data.delimiter ?? ''}|${data.suggestion.source}`}
        orgId={orgId}
        preview={data}
        reading={preview.isFetching}
        specimenHeightMm={specimenHeightMm}
        pending={pending}
        error={error}
        onHeaderRow={(headerRow) => setChoice((c) => ({ ...c, headerRow }))}
        onDelimiter={(delimiter: CsvDelimiter | null) => setChoice((c) => ({ ...c, delimiter: delimiter ?? undefined }))}
        onImport={onImport}
      />
    </section>
  );
}
