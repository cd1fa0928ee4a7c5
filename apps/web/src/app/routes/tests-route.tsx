import { TestStatusSchema, type TestListQuery } from '@porestack/types';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { useProjects } from '../../features/projects/api/get-projects';
import { useTests } from '../../features/tests/api/get-tests';
import { TestsFilters } from '../../features/tests/components/tests-filters';
import { TestsTable } from '../../features/tests/components/tests-table';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { Padded } from './padded';

export function TestsRoute() {
  return (
    <RoleGate roles={rolesFor('tests')} purpose="the laboratory's tests">
      <TestsPage />
    </RoleGate>
  );
}

function filtersFrom(search: URLSearchParams): TestListQuery {
  const status = TestStatusSchema.safeParse(search.get('status'));
  return {
    ...(status.success ? { status: status.data } : {}),
    ...(search.get('projectId') ? { projectId: search.get('projectId') ?? '' } : {}),
    ...(search.get('technicianId') ? { technicianId: search.get('technicianId') ?? '' } : {}),
  };
}

function TestsPage() {
  const { orgId } = useCurrentOrg();
  const [search, setSearch] = useSearchParams();
  const filters = filtersFrom(search);
  const tests = useTests(orgId, filters);
  const everything = useTests(orgId, {});
  const projects = useProjects(orgId);
  const technicians = useMemo(() => {
    const seen = new Map<string, string>();
    for (const t of everything.data ?? []) seen.set(t.technicianId, t.technicianName);
    return [...seen].map(([value, label]) => ({ value, label })).sort((a, b) => a.label.localeCompare(b.label));
  }, [everything.data]);
  const filtered = Object.keys(filters).length > 0;

  return (
    <>
      <PageHeader title="Tests" description="Every consolidation test in the laboratory, newest change first. Open one to work on it." />
      <div className="flex flex-col gap-6">
        <TestsFilters
          filters={filters}
          projects={(projects.data ?? []).map((p) => ({ value: p.id, label: `${p.reference} · ${p.name}` }))}
          technicians={technicians}
          onChange={(next) => setSearch(new URLSearchParams(next as Record<string, string>), { replace: true })}
        />
        <Panel title={filtered ? 'Matching tests' : 'All tests'} flush>
          {tests.isPending ? (
            <Padded><LoadingBlock label="Loading tests…" /></Padded>
          ) : tests.error ? (
            <Padded><ErrorMessage error={tests.error} title="The tests could not be loaded" onRetry={() => void tests.refetch()} /></Padded>
          ) : tests.data.length === 0 ? (
            <Padded>
              <EmptyState title={filtered ? 'No test matches these filters' : 'No tests yet'}>
                {filtered ? 'Change or clear the filters above.' : 'Tests are set up on a sample, from its project page.'}
              </EmptyState>
            </Padded>
          ) : (
            <TestsTable orgId={orgId} tests={tests.data} />
          )}
        </Panel>
      </div>
    </>
  );
}
