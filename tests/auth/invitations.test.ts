import { beforeEach, describe, expect, test } from 'vitest';
import { seedDemo } from '../../db/seed';
import { setDb } from '../../src/lib/db/client';
import { acceptInvitation, createInvitation, lookupInvitation, revokeInvitation, INVITE_DAYS } from '../../src/lib/data/invitations';
import { changeRole, findMember, removeMember } from '../../src/lib/data/memberships';
import { freshDb } from '../helpers/db';

// Real SQLite with the real migrations and the demo seed (Heronsgate: rosa owner, tomas/ana crew;
// Lee owns a personal org).
const HERONSGATE = 'org_demo_heronsgate';
const LEES = 'org_demo_lee';
const DAY = 86_400_000;

beforeEach(() => {
  const { db } = freshDb();
  seedDemo(db);
  setDb(db);
});

describe('invitations', () => {
  test('does let the invited address accept once, then refuse the same link', () => {
    const t0 = new Date('2026-12-01T10:00:00Z');
    const { token } = createInvitation(HERONSGATE, { email: 'New@Crew.test', role: 'member', invitedBy: 'usr_demo_owner' }, t0);
    const who = { id: 'usr_demo_free', email: 'new@crew.test' };
    expect(acceptInvitation(token, who, new Date(t0.getTime() + DAY))).toBe(HERONSGATE);
    expect(findMember(HERONSGATE, 'usr_demo_free')?.role).toBe('member');
    expect(() => acceptInvitation(token, who, new Date(t0.getTime() + DAY))).toThrow(/already been used/);
    expect(lookupInvitation(token).state).toBe('used');
  });

  test('does refuse a link after its expiry (INVITE_DAYS) and accept it just before', () => {
    const t0 = new Date('2026-12-01T10:00:00Z');
    const a = createInvitation(HERONSGATE, { email: 'a@crew.test', role: 'member', invitedBy: 'usr_demo_owner' }, t0);
    const late = new Date(t0.getTime() + INVITE_DAYS * DAY + 1);
    expect(() => acceptInvitation(a.token, { id: 'usr_demo_free', email: 'a@crew.test' }, late)).toThrow(/expired/);
    const b = createInvitation(HERONSGATE, { email: 'b@crew.test', role: 'member', invitedBy: 'usr_demo_owner' }, t0);
    const early = new Date(t0.getTime() + INVITE_DAYS * DAY - 1000);
    expect(acceptInvitation(b.token, { id: 'usr_demo_support', email: 'b@crew.test' }, early)).toBe(HERONSGATE);
  });

  test('does refuse a withdrawn link, an unknown token and a different signed-in address', () => {
    const inv = createInvitation(HERONSGATE, { email: 'c@crew.test', role: 'member', invitedBy: 'usr_demo_owner' });
    expect(() => acceptInvitation(inv.token, { id: 'usr_demo_free', email: 'lee@pondkeeper.example' })).toThrow(/for c@crew.test/);
    revokeInvitation(HERONSGATE, inv.id);
    expect(() => acceptInvitation(inv.token, { id: 'usr_demo_free', email: 'c@crew.test' })).toThrow(/withdrawn/);
    expect(lookupInvitation('not-a-token').state).toBe('unknown');
  });

  test('does refuse another organisation touching Heronsgate invitations and members (IDOR)', () => {
    const inv = createInvitation(HERONSGATE, { email: 'd@crew.test', role: 'member', invitedBy: 'usr_demo_owner' });
    expect(() => revokeInvitation(LEES, inv.id)).toThrow(/No open invitation/);
    expect(() => changeRole(LEES, 'usr_demo_crew1', 'owner')).toThrow(/No such member/);
    expect(() => removeMember(LEES, 'usr_demo_crew1')).toThrow(/No such member/);
    expect(findMember(HERONSGATE, 'usr_demo_crew1')?.role).toBe('member');
    expect(lookupInvitation(inv.token).state).toBe('open');
  });

  test('does keep the last owner and refuse inviting a current member', () => {
    expect(() => removeMember(HERONSGATE, 'usr_demo_owner')).toThrow(/last owner/);
    expect(() => changeRole(HERONSGATE, 'usr_demo_owner', 'member')).toThrow(/at least one owner/);
    expect(() => createInvitation(HERONSGATE, { email: 'tomas@heronsgate.example', role: 'member', invitedBy: 'usr_demo_owner' })).toThrow(/already/);
  });
});
