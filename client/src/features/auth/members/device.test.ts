import { afterEach, describe, expect, it, vi } from 'vitest';
import { openReplica, replicaName } from '@/db/open';
import { listRecords } from '@/db/queries';
import { createRecord, type WriteContext } from '@/db/write';
import { sessionAuth } from '@/sync/auth-source';
import { SyncRunner } from '@/sync/runner';
import { FakeBackend, T0 } from '@/sync/test/fake-backend';
import { defectFields } from '@/sync/test/device';
import { sessionAnswer } from '@/test/fixtures';
import type { SessionAnswer } from '../api/types';
import { tokenStore } from '../token-store';
import { noteSignedIn, setMemberPin, signInMember, switchToMember } from './device';
import { removeMember, unsentChanges } from './device-data';
import { FIRST_WAIT_MS } from './lockout';
import { hashPin } from './pin';
import { roster } from './roster';

const CLUB = 'club-gannet';

/** An invented member of an invented club, with tokens the fake server knows. */
function member(backend: FakeBackend, userId: string, displayName: string, role: 'crew' | 'driver', overrides: Partial<SessionAnswer> = {}): SessionAnswer {
  const base = sessionAnswer(role);
  const answer: SessionAnswer = {
    ...base,
    accessToken: `access-${userId}`,
    refreshToken: `refresh-${userId}`,
    user: { id: userId, email: `${userId}@gannetbay.example`, displayName },
    activeClub: { ...base.activeClub, id: CLUB, name: 'Gannet Bay SLSC', role },
    memberships: [{ clubId: CLUB, clubName: 'Gannet Bay SLSC', role }],
    ...overrides,
  };
  backend.grant(answer.accessToken, { userId, role, clubId: CLUB });
  return answer;
}

/** What the screens write with: the active member's replica and identity (on the fake server's clock). */
function activeWriter(): WriteContext {
  const s = tokenStore.getState().session!;
  return { db: openReplica(s.user.id), userId: s.user.id, clubId: s.activeClub.id, role: s.activeClub.role, now: () => T0 };
}

/** Records which bearer token carried each pushed record. */
function watchPushes(backend: FakeBackend) {
  const pushedWith = new Map<string, string>();
  const fetch: typeof globalThis.fetch = async (input, init = {}) => {
    const url = new URL(String(input), 'http://phone.test');
    if (url.pathname === '/api/sync/push') {
      const token = new Headers(init.headers).get('Authorization')?.replace(/^Bearer /, '') ?? '';
      const raw = new Headers(init.headers).get('Content-Encoding') === 'gzip'
        ? await new Response(new Response(init.body as BodyInit).body!.pipeThrough(new DecompressionStream('gzip'))).text()
        : String(init.body);
      for (const m of (JSON.parse(raw) as { mutations: { recordId: string }[] }).mutations) pushedWith.set(m.recordId, token);
      return backend.fetch(input, { ...init, body: raw, headers: { ...Object.fromEntries(new Headers(init.headers)), 'Content-Encoding': 'identity' } });
    }
    return backend.fetch(input, init);
  };
  return { pushedWith, fetch };
}

const runnerFor = (fetch: typeof globalThis.fetch) =>
  new SyncRunner({ auth: sessionAuth, openDb: openReplica, onOutdated: () => undefined, fetch, now: () => T0, setTimer: () => null, clearTimer: () => undefined });

async function deleteReplicas(...userIds: string[]) {
  for (const id of userIds) await openReplica(id).delete({ disableAutoOpen: false });
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('a shared device: members switch with a PIN', () => {
  it('switches offline with the PIN, and sends each member\'s changes with their own tokens', async () => {
    const backend = new FakeBackend();
    const ana = member(backend, 'u-ana', 'Ana Kereama', 'driver');
    const ben = member(backend, 'u-ben', 'Ben Halloran', 'crew');
    // Ana signed in first with her password; Ben was added with his, and both chose a PIN.
    tokenStore.saveSession(ana);
    noteSignedIn(ana);
    await setMemberPin('u-ana', '2580');
    await signInMember(ben, '1357');
    expect(tokenStore.getState().session?.user.id).toBe('u-ben');
    expect(roster.find('u-ana')?.session?.refreshToken).toBe('refresh-u-ana');

    const bens = await createRecord(activeWriter(), 'defect', defectFields({ reportedBy: 'u-ben', description: 'Bow handle loose' }));

    // No signal in the shed: the switch must not need the server.
    const offline = vi.fn(async () => {
      throw new TypeError('Failed to fetch');
    });
    vi.stubGlobal('fetch', offline);
    expect(await switchToMember('u-ana', '2580')).toEqual({ ok: true });
    expect(offline).not.toHaveBeenCalled();
    expect(tokenStore.getState().session?.user.id).toBe('u-ana');
    expect(roster.find('u-ben')?.session?.accessToken).toBe('access-u-ben');
    expect(roster.find('u-ana')?.session).toBeNull();
    const anas = await createRecord(activeWriter(), 'defect', defectFields({ reportedBy: 'u-ana', description: 'Kill cord clip cracked' }));

    // Each member's change sits in their own outbox.
    expect((await openReplica('u-ben').outbox.toArray()).map((e) => e.recordId)).toEqual([bens]);
    expect((await openReplica('u-ana').outbox.toArray()).map((e) => e.recordId)).toEqual([anas]);

    // Back at the clubhouse: one sync sends both, each with its member's token.
    const watch = watchPushes(backend);
    await runnerFor(watch.fetch).requestSync();
    expect(watch.pushedWith.get(anas)).toBe('access-u-ana');
    expect(watch.pushedWith.get(bens)).toBe('access-u-ben');
    expect(backend.server.record(CLUB, anas)?.fields.reportedBy).toBe('u-ana');
    expect(backend.server.record(CLUB, bens)?.fields.reportedBy).toBe('u-ben');
    expect(await unsentChanges('u-ana')).toBe(0);
    expect(await unsentChanges('u-ben')).toBe(0);
    // Ben's sync ran as Ben, into his own replica: it now holds what Ben may see, both defects.
    expect((await listRecords(openReplica('u-ben'), CLUB, 'defect')).map((r) => r.id).sort()).toEqual([anas, bens].sort());
    await deleteReplicas('u-ana', 'u-ben');
  });

  it('refuses a wrong PIN, then makes each further wrong one wait longer, across a reload', async () => {
    const backend = new FakeBackend();
    const ana = member(backend, 'u-ana2', 'Ana Kereama', 'driver');
    const ben = member(backend, 'u-ben2', 'Ben Halloran', 'crew');
    tokenStore.saveSession(ana);
    noteSignedIn(ana);
    await signInMember(ben);
    // A low iteration count keeps ten tries quick; the count stored with the hash is the one used.
    const pin = await hashPin('2580', 1000);
    roster.update('u-ana2', (m) => (m ? { ...m, pin } : null));

    const t0 = Date.parse('2026-12-06T06:00:00Z');
    for (const left of [4, 3, 2, 1]) {
      expect(await switchToMember('u-ana2', '0000', t0)).toEqual({ ok: false, reason: 'wrong-pin', triesLeft: left });
    }
    expect(await switchToMember('u-ana2', '0000', t0)).toEqual({ ok: false, reason: 'wait', waitMs: FIRST_WAIT_MS });
    // A reload (or another tab) does not forget the wait.
    roster.reload();
    expect(await switchToMember('u-ana2', '2580', t0 + 10_000)).toEqual({ ok: false, reason: 'wait', waitMs: FIRST_WAIT_MS - 10_000 });
    expect(tokenStore.getState().session?.user.id).toBe('u-ben2');
    // After the wait one more wrong PIN waits twice as long.
    expect(await switchToMember('u-ana2', '1111', t0 + FIRST_WAIT_MS)).toEqual({ ok: false, reason: 'wait', waitMs: 2 * FIRST_WAIT_MS });
    expect(await switchToMember('u-ana2', '2580', t0 + 3 * FIRST_WAIT_MS)).toEqual({ ok: true });
    expect(tokenStore.getState().session?.user.id).toBe('u-ana2');
    expect(roster.find('u-ana2')?.tries).toEqual({ wrong: 0, lockedUntil: null });
    // A member with no PIN on this device is switched to with the password only.
    expect(await switchToMember('u-ben2', '1357', t0)).toEqual({ ok: false, reason: 'password' });
    await deleteReplicas('u-ana2', 'u-ben2');
  });

  it('keeps the outbox of a member whose tokens the server refused, and asks only them for the password', async () => {
    const backend = new FakeBackend();
    const ana = member(backend, 'u-ana3', 'Ana Kereama', 'driver');
    const ben = member(backend, 'u-ben3', 'Ben Halloran', 'crew', { accessExpiresAt: '2000-01-01T00:00:00Z' });
    tokenStore.saveSession(ben);
    noteSignedIn(ben);
    const bens = await createRecord(activeWriter(), 'defect', defectFields({ reportedBy: 'u-ben3' }));
    await signInMember(ana, '2580');
    backend.routes['POST /api/auth/refresh'] = () =>
      new Response(JSON.stringify({ statusCode: 401, code: 'unauthorized', message: 'Refresh token refused.' }), { status: 401 });
    vi.stubGlobal('fetch', backend.fetch); // the refresh goes through apiRequest and the global fetch

    await runnerFor(backend.fetch).requestSync();
    expect(tokenStore.getState().session?.user.id).toBe('u-ana3');
    expect(roster.find('u-ben3')).toMatchObject({ session: null, displayName: 'Ben Halloran' });
    expect((await openReplica('u-ben3').outbox.toArray()).map((e) => e.recordId)).toEqual([bens]);
    expect(backend.server.record(CLUB, bens)).toBeUndefined();
    expect(await switchToMember('u-ben3', '1357')).toEqual({ ok: false, reason: 'password' });

    // Ben signs in with his password again: his waiting change goes with his new token.
    const again = member(backend, 'u-ben3', 'Ben Halloran', 'crew', { accessToken: 'access-u-ben3-new', refreshToken: 'refresh-u-ben3-new' });
    await signInMember(again, '1357');
    await runnerFor(backend.fetch).requestSync();
    expect(backend.server.record(CLUB, bens)?.fields.reportedBy).toBe('u-ben3');
    await deleteReplicas('u-ana3', 'u-ben3');
  });

  it('removes a member: unsent changes and their copy stay; with nothing unsent the copy goes', async () => {
    const backend = new FakeBackend();
    const ana = member(backend, 'u-ana4', 'Ana Kereama', 'driver');
    const ben = member(backend, 'u-ben4', 'Ben Halloran', 'crew');
    tokenStore.saveSession(ben);
    noteSignedIn(ben);
    await createRecord(activeWriter(), 'defect', defectFields({ reportedBy: 'u-ben4' }));
    await signInMember(ana, '2580');
    vi.stubGlobal('fetch', vi.fn(async () => new Response(null, { status: 204 })));

    expect(await removeMember(roster.find('u-ben4')!)).toEqual({ kept: 1 });
    expect(roster.find('u-ben4')).toBeUndefined();
    expect((await indexedDB.databases()).map((d) => d.name)).toContain(replicaName('u-ben4'));
    expect(await openReplica('u-ben4').outbox.count()).toBe(1);

    // Ana, active and with nothing unsent, removes herself: signed out, her copy deleted.
    await openReplica('u-ana4').open();
    expect(await removeMember(roster.find('u-ana4')!)).toEqual({ kept: 0 });
    expect(tokenStore.getState().session).toBeNull();
    expect((await indexedDB.databases()).map((d) => d.name)).not.toContain(replicaName('u-ana4'));
    await deleteReplicas('u-ben4');
  });
});
