import { DomainError } from '../../errors/domain-error.js';

export const lastAdmin = (what: 'demote' | 'remove') =>
  new DomainError(
    'last_admin',
    what === 'demote'
      ? 'This member is the organisation’s only administrator, so the administrator role cannot be taken away. Make another member an administrator first.'
      : 'This member is the organisation’s only administrator and cannot be removed. Make another member an administrator first.',
  );

export const ownRolesNeedAnotherAdmin = () =>
  new DomainError(
    'forbidden',
    'You cannot add a role to yourself while you stay an administrator and the organisation has other administrators. Ask one of them to add it; giving up roles you may do yourself.',
  );
