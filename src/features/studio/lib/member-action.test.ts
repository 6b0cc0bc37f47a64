import { describe, expect, it } from 'vitest';
import type { MemberView } from '@shared/schemas/auth';
import { memberActionChanges, memberActionText } from './member-action';

const rowan: MemberView = { id: 7, email: 'rowan@fernhill.example', name: 'Rowan Pike', role: 'cutter', disabled: false, createdAt: '2025-03-01T10:00:00.000Z' };

describe('member actions', () => {
  it('sends only the field that changes', () => {
    expect(memberActionChanges({ kind: 'role', member: rowan, role: 'owner' })).toEqual({ role: 'owner' });
    expect(memberActionChanges({ kind: 'disable', member: rowan })).toEqual({ disabled: true });
    expect(memberActionChanges({ kind: 'enable', member: { ...rowan, disabled: true } })).toEqual({ disabled: false });
  });

  it('names the member on the confirming button of a removal and marks it dangerous', () => {
    const text = memberActionText({ kind: 'remove', member: rowan }, false);
    expect(text.confirmLabel).toBe('Remove Rowan Pike');
    expect(text.tone).toBe('danger');
  });

  it('warns an owner who is about to demote themselves', () => {
    const owner = { ...rowan, role: 'owner' as const };
    const self = memberActionText({ kind: 'role', member: owner, role: 'cutter' }, true);
    const other = memberActionText({ kind: 'role', member: owner, role: 'cutter' }, false);
    expect(self.title).toBe('Make yourself a cutter?');
    expect(self.tone).toBe('danger');
    expect(other.tone).toBe('primary');
  });
});
