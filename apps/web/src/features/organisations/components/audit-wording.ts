import { ROLE_LABELS, RoleSchema, RolesSchema, roleList, TEST_STATUS_LABELS, TestStatusSchema, type AuditEntry } from '@porestack/types';

/** Words for a field of an edited object, as the activity page names it. */
const FIELD_WORDS: Record<string, string> = {
  name: 'name',
  reference: 'reference',
  clientName: 'client',
  siteName: 'site',
  designers: 'designers',
  technician: 'technician',
  apparatusName: 'apparatus',
  startedOn: 'start date',
  finishedOn: 'finish date',
  initialHeightMm: 'initial height (mm)',
  diameterMm: 'diameter (mm)',
  specificGravity: 'specific gravity Gs',
  dryMassG: 'dry mass (g)',
  initialWaterContent: 'initial water content',
  wetMassG: 'wet mass (g)',
  finalWaterContent: 'final water content',
  drainage: 'drainage',
  compliance: 'apparatus calibration',
};

/** A value in a sentence: roles and statuses by their labels, lists joined, nothing as a dash. */
export function describeValue(value: unknown): string {
  const role = RoleSchema.safeParse(value);
  if (role.success) return ROLE_LABELS[role.data];
  const roles = RolesSchema.safeParse(value);
  if (roles.success) return roleList(roles.data);
  const status = TestStatusSchema.safeParse(value);
  if (status.success) return TEST_STATUS_LABELS[status.data];
  if (value === null || value === undefined || value === '') return '—';
  if (Array.isArray(value)) {
    if (value.every((v) => typeof v === 'string')) return value.length === 0 ? 'none' : value.join(', ');
    return `${value.length} ${value.length === 1 ? 'entry' : 'entries'}`;
  }
  if (typeof value === 'object') return 'changed settings';
  return String(value);
}

type Change = { field: string; from: unknown; to: unknown };

function isChange(value: unknown): value is Change {
  return typeof value === 'object' && value !== null && 'field' in value && 'from' in value && 'to' in value;
}

/** "site: — → North yard; apparatus: Frame 2 → Frame 3". */
export function describeChanges(changes: unknown): string | null {
  if (!Array.isArray(changes)) return null;
  const parts = changes.filter(isChange).map((c) => `${FIELD_WORDS[c.field] ?? c.field.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()}: ${describeValue(c.from)} → ${describeValue(c.to)}`);
  return parts.length === 0 ? 'nothing changed' : parts.join('; ');
}

/** The roles an entry names: `roles` (a set, since memberships hold several) or the single `role` of older entries. */
const rolesOf = (details: Record<string, unknown>) => describeValue(details['roles'] ?? details['role']);

const text = (value: unknown) => (typeof value === 'string' && value !== '' ? value : null);

/** The object of an entry as a noun phrase: "test PLM-OED-03", "project PLM-2041 Saltmarsh Lane". */
function objectPhrase(entry: AuditEntry): string {
  const label = entry.objectLabel ?? text(entry.details['reference']) ?? text(entry.details['email']);
  const noun: Record<string, string> = {
    consolidation_test: 'test',
    project: 'project',
    soil_record: 'the soil record of test',
    sample: 'sample',
    borehole: 'borehole',
    invitation: 'the invitation of',
    upload: 'readings file',
    issued_report: 'the test report of',
    user: '',
    organisation: 'organisation',
  };
  const word = noun[entry.objectType] ?? entry.objectType.replaceAll('_', ' ');
  if (!label) return word ? `a ${word.replace(/^the /, '').replace(/ of( test)?$/, '')} since removed` : 'someone since removed';
  return word ? `${word} ${label}` : label;
}

type Sentence = (entry: AuditEntry, object: string) => string;

const SENTENCES: Record<string, Sentence> = {
  'organisation.created': (_e, o) => `Created the ${o}`,
  'invitation.created': (e) => {
    const projects = Array.isArray(e.details['projects']) ? (e.details['projects'] as unknown[]).map(String) : [];
    return `Invited ${describeValue(e.details['email'])} as ${rolesOf(e.details)}${projects.length > 0 ? `, with project ${projects.join(', ')}` : ''}`;
  },
  'invitation.revoked': (e) => `Withdrew the invitation of ${describeValue(e.details['email'])} (${rolesOf(e.details)})`,
  'invitation.accepted': (e) => `Accepted the invitation and joined as ${rolesOf(e.details)}`,
  'member.role_changed': (e, o) => `Changed the roles of ${o}: ${describeValue(e.details['from'])} → ${describeValue(e.details['to'])}`,
  'member.removed': (e, o) => `Removed ${o} (${rolesOf(e.details)}) from the organisation`,
  'project.created': (_e, o) => `Created ${o}`,
  'project.updated': (e, o) => `Edited ${o}: ${describeChanges(e.details['changes']) ?? 'details changed'}`,
  'project.shared': (e, o) => `Shared ${o} with ${describeValue(e.details['email'])}${e.details['by'] === 'invitation' ? ' (invited as a client)' : ''}`,
  'project.share_withdrawn': (e, o) => `Withdrew ${o} from ${describeValue(e.details['email'])}${e.details['by'] === 'pending invitation' ? ' (invitation not yet accepted)' : ''}`,
  'borehole.created': (_e, o) => `Recorded ${o}`,
  'sample.created': (_e, o) => `Recorded ${o}`,
  'test.created': (_e, o) => `Created ${o}`,
  'test.updated': (e, o) => `Edited ${o}: ${describeChanges(e.details['changes']) ?? 'set-up changed'}`,
  'test.picks_changed': (e, o) => `Overrode automatic choices on ${o}${text(e.details['reason']) ? `: “${String(e.details['reason'])}”` : ''}`,
  'test.readings_uploaded': (_e, o) => `Imported new readings into ${o}`,
  'test.analysed': (_e, o) => `Analysed ${o}`,
  'test.submitted': (_e, o) => `Sent ${o} for review`,
  'test.approved': (_e, o) => `Approved ${o}`,
  'test.changes_requested': (e, o) => `Sent ${o} back for changes${text(e.details['comment']) ? `: “${String(e.details['comment'])}”` : ''}`,
  'soil_record.version_created': (e, o) => `Issued version ${describeValue(e.details['version'])} of ${o}${e.details['supersedes'] ? `, replacing version ${describeValue(e.details['supersedes'])}` : ''}`,
  'upload.stored': (_e, o) => `Uploaded ${o}`,
  'organisation.report_settings_changed': (e) => `Changed what the reports print: ${describeSettings(e.details['from'], e.details['to'])}`,
  'report.requested': (_e, o) => `Asked for ${o}, approved before reports were printed`,
  'report.retried': (e, o) => `Asked again for ${o}${text(e.details['previousFailure']) ? `, after “${String(e.details['previousFailure'])}”` : ''}`,
};

/** The report settings that changed, old → new: "address: — → 1 Invented Road". */
function describeSettings(from: unknown, to: unknown): string {
  const before = (typeof from === 'object' && from !== null ? from : {}) as Record<string, unknown>;
  const after = (typeof to === 'object' && to !== null ? to : {}) as Record<string, unknown>;
  const names: Record<string, string> = { address: 'address', testMethodStatement: 'test method statement' };
  const parts = Object.keys(names)
    .filter((key) => describeValue(before[key]) !== describeValue(after[key]))
    .map((key) => `${names[key]}: ${describeValue(before[key])} → ${describeValue(after[key])}`);
  return parts.length === 0 ? 'nothing changed' : parts.join('; ');
}

/** An entry as one plain sentence: who did what to which object, and how it changed. */
export function describeEntry(entry: AuditEntry): string {
  const sentence = SENTENCES[entry.action];
  if (sentence) return sentence(entry, objectPhrase(entry));
  const [subject = '', verb = ''] = entry.action.split('.');
  const words = (value: string) => value.replaceAll('_', ' ');
  return `${words(subject).charAt(0).toUpperCase()}${words(subject).slice(1)}${verb ? `: ${words(verb)}` : ''} — ${objectPhrase(entry)}`;
}
