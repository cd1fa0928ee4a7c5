import { ROLE_LABELS, roleList } from '@porestack/types';
import { Link } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { navItemsFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { ROLE_GUIDES } from '../role-guides';

export function OrgHomeRoute() {
  const { orgId, membership } = useCurrentOrg();
  const { roles } = membership;
  const several = roles.length > 1;
  const pages = navItemsFor(roles).filter((item) => item.id !== 'home');

  return (
    <>
      <PageHeader
        title={membership.organisationName}
        description={
          <>
            You are <strong className="font-medium text-slate-800">{roleList(roles).toLowerCase()}</strong> here.{' '}
            {roles.map((role) => ROLE_GUIDES[role].summary).join(' ')}
          </>
        }
      />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Panel title={several ? 'What your roles cover' : 'What your role covers'}>
          <div className="space-y-4">
            {roles.map((role) => (
              <section key={role} aria-label={several ? `As ${ROLE_LABELS[role].toLowerCase()}` : undefined}>
                {several ? <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-slate-500">As {ROLE_LABELS[role].toLowerCase()}</h3> : null}
                <ul className="divide-y divide-slate-100">
                  {ROLE_GUIDES[role].tasks.map((task) => (
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
              </section>
            ))}
          </div>
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
              No pages for your {several ? 'roles' : 'role'} yet. This version sets up accounts and organisations; the laboratory work arrives in
              the next versions.
            </p>
          )}
        </Panel>
      </div>
    </>
  );
}
