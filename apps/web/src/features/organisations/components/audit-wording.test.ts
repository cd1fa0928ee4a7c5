import type { AuditEntry } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { describeEntry } from './audit-wording';

const entry = (over: Partial<AuditEntry>): AuditEntry => ({
  id: '00000000-0000-4000-8000-000000000001',
  at: '2026-01-05T10:00:00.000Z',
  actorName: 'Priya',
  action: 'x.y',
  objectType: 'project',
  objectId: '00000000-0000-4000-8000-000000000002',
  objectLabel: null,
  details: {},
  ...over,
});

describe('describeEntry(entry)', () => {
  it('names the test and each changed field old → new, never an id or JSON', () => {
    const text = describeEntry(
      entry({
        action: 'test.updated',
        objectType: 'consolidation_test',
        objectLabel: 'PLM-OED-03',
        details: { changes: [{ field: 'apparatusName', from: 'Frame 2', to: 'Frame 3' }, { field: 'initialHeightMm', from: 20, to: 19.8 }] },
      }),
    );
    expect(text).toBe('Edited test PLM-OED-03: apparatus: Frame 2 → Frame 3; initial height (mm): 20 → 19.8');
  });

  it('says who a project was shared with and who it was withdrawn from', () => {
    expect(describeEntry(entry({ action: 'project.shared', objectLabel: 'PLM-2041 Saltmarsh Lane', details: { email: 'c@x.test', by: 'invitation' } }))).toBe(
      'Shared project PLM-2041 Saltmarsh Lane with c@x.test (invited as a client)',
    );
    expect(describeEntry(entry({ action: 'project.share_withdrawn', objectLabel: 'PLM-2041 Saltmarsh Lane', details: { email: 'c@x.test' } }))).toBe(
      'Withdrew project PLM-2041 Saltmarsh Lane from c@x.test',
    );
  });

  it('gives roles their labels, a set of roles as a list', () => {
    expect(describeEntry(entry({ action: 'member.role_changed', objectType: 'user', objectLabel: 'Tomas', details: { from: ['technician'], to: ['technician', 'lab_manager'] } }))).toBe(
      'Changed the roles of Tomas: Technician → Technician and Lab manager',
    );
    expect(describeEntry(entry({ action: 'invitation.created', objectType: 'invitation', objectLabel: 'a@x.test', details: { email: 'a@x.test', roles: ['client'], projects: ['PLM-2041'] } }))).toBe(
      'Invited a@x.test as Client, with project PLM-2041',
    );
  });

  it('says when the object has since been removed rather than showing its id', () => {
    const text = describeEntry(entry({ action: 'test.created', objectType: 'consolidation_test', objectLabel: null }));
    expect(text).toBe('Created a test since removed');
    expect(text).not.toContain('0000');
  });
});
