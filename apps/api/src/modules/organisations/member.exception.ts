import { DomainError } from '../../errors/domain-error.js';

export const lastAdmin = (what: 'demote' | 'remove') =>
  new DomainError(
    'last_admin',
    what === 'demote'
      ? 'This member is the organisation’s only administrator, so their role cannot change. Make another member an administrator first.'
      : 'This member is the organisation’s only administrator and cannot be removed. Make another member an administrator first.',
  );
