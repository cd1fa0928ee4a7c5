import { ROLE_LABELS, RoleSchema, RolesSchema, roleList } from '@porestack/types';

/** Plain words for the actions we know; later issues add theirs here. */
const ACTION_WORDS: Record<string, string> = {
  'organisation.created': 'Created the organisation',
  'invitation.created': 'Sent an invitation',
  'invitation.revoked': 'Revoked an invitation',
  'invitation.accepted': 'Accepted an invitation',
  'membership.role_changed': 'Changed a member’s role',
  'membership.removed': 'Removed a member',
  'membership.created': 'Joined the organisation',
  'auth.signed_in': 'Signed in',
  'auth.signed_out': 'Signed out',
};

/** 'invitation.created' → "Sent an invitation"; an unknown 'sample.moved_to_store' → "Sample: moved to store". */
export function describeAction(action: string): string {
  const known = ACTION_WORDS[action];
  if (known) return known;
  const [subject = '', verb = ''] = action.split('.');
  const words = (text: string) => text.replaceAll('_', ' ');
  const capitalised = words(subject).charAt(0).toUpperCase() + words(subject).slice(1);
  return verb ? `${capitalised}: ${words(verb)}` : capitalised;
}

function describeValue(value: unknown): string {
  const role = RoleSchema.safeParse(value);
  if (role.success) return ROLE_LABELS[role.data];
  const roles = Array.isArray(value) && value.length > 0 ? RolesSchema.safeParse(value) : null;
  if (roles?.success) return roleList(roles.data);
  if (value === null || value === undefined) return '—';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

/** `{ email: 'a@b', roles: ['technician', 'lab_manager'] }` → "email: a@b · roles: Technician and Lab manager". */
export function describeDetails(details: Record<string, unknown>): string {
  const parts = Object.entries(details).map(([key, value]) => `${key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}: ${describeValue(value)}`);
  return parts.length > 0 ? parts.join(' · ') : '—';
}
