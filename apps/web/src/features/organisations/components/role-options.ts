import { ROLE_LABELS, ROLES } from '@porestack/types';
import type { SelectOption } from '../../../components/select';

export const ROLE_OPTIONS: readonly SelectOption[] = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
