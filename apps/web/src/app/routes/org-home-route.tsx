import { ROLE_LABELS } from '@porestack/types';
import { Link } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { navItemsFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { ROLE_GUIDES } from '../role-guides';

export function OrgHomeRoute() {
  const { orgId, membership } = useCurrentOrg();
  const guide = ROLE_GUIDES[membership.role];
  const pages = navItemsFor(membership.role).filter((item) => item.id !== 'home');

  return (
    <>
      <PageHeader
        title={membership.organisationName}
        description={
          <>
            You are <strong className="font-medium text-slate-800">{ROLE_LABELS[membership.role].toLowerCase()}</strong> here. {guide.summary}
          </>
        }
      />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Panel title="What your role covers">
          <ul className="divide-y divide-slate-100">
            {guide.tasks.map((task) => (
              <li key={task.text} className="flex items-start justify-between gap-4 py-2.5 first:pt-0 last:pb-0">
                <span className="text-sm text-slate-800">{task.text}</span>
                <span
                  className={`shrink-0 rounded-full px-2 py-0.5 text-xs font-medium ${
                    task.available ? 'bg-accent-50 text-accent-800' : 'bg-slate-100 text-slate-600'
                  }`}
                >
                  {task.available ? 'Available' : 'Not yet in Porestack'}
                </span>
              </li>
            ))}
          </ul>
        </Panel>
        <Panel title="Go to">
          {pages.length > 0 ? (
            <ul className="space-y-2">
              {pages.map((item) => (
                <li key={item.id}>
                  <Link to={item.to(orgId)} className="text-sm font-medium text-accent-700 hover:underline">
                    {item.label}
                  </Link>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-slate-600">
              No pages for your role yet. This version sets up accounts and organisations; the laboratory work arrives in
              the next versions.
            </p>
          )}
        </Panel>
      </div>
    </>
  );
}
