import type { Membership, User } from '@porestack/types';
import type { ReactNode } from 'react';
import { paths } from '../../config/paths';
import { Brand } from './brand';
import { FooterCaution } from './footer-caution';
import { MainNav } from './main-nav';
import { OrgSwitcher } from './org-switcher';
import { UserMenu } from './user-menu';

type AppShellProps = {
  user: User;
  memberships: readonly Membership[];
  /** null when the URL names an organisation the person is not in. */
  current: Membership | null;
  children: ReactNode;
};

/** The signed-in frame: header (product, organisation, navigation, user), the page, and the caution. */
export function AppShell({ user, memberships, current, children }: AppShellProps) {
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded-md focus:bg-white focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-slate-200 bg-white">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2.5 sm:px-6">
          <Brand to={current ? paths.org.home.to(current.organisationId) : paths.root.to()} />
          <OrgSwitcher memberships={memberships} currentOrgId={current?.organisationId ?? null} />
          <div className="ml-auto">
            <UserMenu user={user} roles={current?.roles ?? null} />
          </div>
        </div>
        {current ? (
          <div className="mx-auto max-w-6xl px-4 sm:px-6">
            <MainNav orgId={current.organisationId} roles={current.roles} />
          </div>
        ) : null}
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </main>
      <FooterCaution />
    </div>
  );
}
