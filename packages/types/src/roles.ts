import { z } from 'zod';

/** The five roles a member can hold in one organisation; a membership holds one or more of them. */
export const ROLES = ['admin', 'technician', 'lab_manager', 'designer', 'client'] as const;
export const RoleSchema = z.enum(ROLES, { error: `Choose one of the listed roles: ${ROLES.join(', ')}.` });
export type Role = z.infer<typeof RoleSchema>;

/** Words shown to people for each role. */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  technician: 'Technician',
  lab_manager: 'Lab manager',
  designer: 'Designer',
  client: 'Client',
};

/** The roles of the laboratory's own staff, who work across the whole organisation. */
export const LAB_STAFF_ROLES = ['admin', 'technician', 'lab_manager'] as const satisfies readonly Role[];

/** The held roles in the order of ROLES, each once: how roles are stored, compared and shown. */
export function canonicalRoles(roles: Iterable<Role>): Role[] {
  const held = new Set(roles);
  return ROLES.filter((role) => held.has(role));
}

/**
 * A membership's roles: at least one, each once. Answers in the order of ROLES, whatever
 * order they were given in, so two equal sets are equal arrays.
 */
export const RolesSchema = z
  .array(RoleSchema, { message: 'Choose the roles from the list.' })
  .min(1, { message: 'Choose at least one role.' })
  .transform((roles) => canonicalRoles(roles));

/** Whether a member holding `held` may do what any of `allowed` may do. */
export function holdsAnyRole(held: readonly Role[], allowed: readonly Role[]): boolean {
  return held.some((role) => allowed.includes(role));
}

/** "Administrator", "Administrator and Lab manager", "Administrator, Technician and Lab manager". */
export function roleList(roles: readonly Role[]): string {
  const labels = canonicalRoles(roles).map((role) => ROLE_LABELS[role]);
  if (labels.length <= 1) return labels.join('');
  return `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
}
