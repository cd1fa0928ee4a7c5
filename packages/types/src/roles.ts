import { z } from 'zod';

/** The five roles a member can hold in one organisation. */
export const ROLES = ['admin', 'technician', 'lab_manager', 'designer', 'client'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

/** Words shown to people for each role. */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  technician: 'Technician',
  lab_manager: 'Lab manager',
  designer: 'Designer',
  client: 'Client',
};
