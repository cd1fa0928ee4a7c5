import { TEST_STATUS_HINTS, TEST_STATUS_LABELS, TEST_STATUSES, type HomeOverview, type WaitingTest } from '@porestack/types';
import { Link } from 'react-router-dom';
import { Panel } from '../../../components/panel';
import { TestStatusBadge } from '../../../components/test-status-badge';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { HomeList } from './home-list';

/** What waits on the technician, in words, and which part of the test page deals with it. */
const WAITING: Record<WaitingTest['reason'], { words: string; section: string }> = {
  analysis_failed: { words: 'The analysis failed', section: 'results' },
  import_failed: { words: 'The readings import failed', section: 'readings' },
  changes_requested: { words: 'The lab manager asked for changes', section: 'review' },
  ready_to_submit: { words: 'Analysed: check the curves and submit', section: 'curves' },
  needs_readings: { words: 'Waiting for its readings file', section: 'readings' },
};

export function TechnicianHome({ orgId, section }: { orgId: string; section: NonNullable<HomeOverview['technician']> }) {
  const total = TEST_STATUSES.reduce((n, s) => n + section.countsByStatus[s], 0);
  return (
    <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <Panel title="Waiting on you" description="Your tests that need something from you, most urgent first.">
        <HomeList
          label="Tests waiting on you"
          empty="Nothing waits on you: your tests are with the lab manager or approved."
          items={section.waiting.map((t) => ({
            key: t.testId,
            to: `${paths.org.test.to(orgId, t.testId)}?section=${WAITING[t.reason].section}`,
            title: `${t.testReference} · ${WAITING[t.reason].words}`,
            meta: (
              <>
                {t.projectName} · {t.boreholeName} / {t.sampleReference} at {t.topDepthM.toFixed(2)} m
                {t.detail ? <span className="mt-0.5 block whitespace-pre-line text-slate-800">“{t.detail}”</span> : null}
              </>
            ),
            aside: formatDateTime(t.updatedAt),
          }))}
        />
      </Panel>
      <Panel title="Your tests by status" description={`${total} ${total === 1 ? 'test' : 'tests'} in all.`}>
        <ul className="space-y-2" aria-label="Your tests by status">
          {TEST_STATUSES.map((status) => (
            <li key={status} className="flex items-center justify-between gap-3 text-sm" title={TEST_STATUS_HINTS[status]}>
              <TestStatusBadge status={status} />
              <span className="tabular-nums font-medium text-slate-900" aria-label={`${TEST_STATUS_LABELS[status]}: ${section.countsByStatus[status]}`}>
                {section.countsByStatus[status]}
              </span>
            </li>
          ))}
        </ul>
        <p className="mt-4 text-sm">
          <Link to={paths.org.tests.to(orgId)} className="font-medium text-accent-700 hover:underline">All tests →</Link>
        </p>
      </Panel>
    </div>
  );
}
