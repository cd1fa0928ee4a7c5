import { TEST_STATUS_LABELS, TEST_STATUSES, type TestListQuery, type TestStatus } from '@porestack/types';
import { Select } from '../../../components/select';

type Option = { value: string; label: string };

type TestsFiltersProps = {
  filters: TestListQuery;
  projects: readonly Option[];
  technicians: readonly Option[];
  onChange: (filters: TestListQuery) => void;
};

export const STATUS_FILTER_OPTIONS: Option[] = [{ value: '', label: 'Any status' }, ...TEST_STATUSES.map((s) => ({ value: s, label: TEST_STATUS_LABELS[s] }))];

/** Narrow the list by status, project or technician; the choice lives in the URL so it can be shared. */
export function TestsFilters({ filters, projects, technicians, onChange }: TestsFiltersProps) {
  const set = (key: keyof TestListQuery, value: string) => {
    const next: Record<string, string> = { ...(filters as Record<string, string>) };
    if (value === '') delete next[key];
    else next[key] = value;
    onChange(next as TestListQuery);
  };
  return (
    <div className="grid gap-4 sm:grid-cols-3" role="group" aria-label="Filter tests">
      <Select label="Status" options={STATUS_FILTER_OPTIONS} value={filters.status ?? ''} onChange={(e) => set('status', e.target.value as TestStatus | '')} />
      <Select label="Project" options={[{ value: '', label: 'All projects' }, ...projects]} value={filters.projectId ?? ''} onChange={(e) => set('projectId', e.target.value)} />
      <Select label="Technician" options={[{ value: '', label: 'Anyone' }, ...technicians]} value={filters.technicianId ?? ''} onChange={(e) => set('technicianId', e.target.value)} />
    </div>
  );
}
