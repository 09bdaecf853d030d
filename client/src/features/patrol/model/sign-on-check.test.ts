import { describe, expect, it } from 'vitest';
import type { LocalRecord } from '@/db/types';
import { signOnVerdict } from './sign-on-check';
import { memberFields } from '../testing/records';

const card = (awards: LocalRecord<'member'>['fields']['awards']): LocalRecord<'member'> => ({
  id: '0190c000-0000-7000-8000-0000000000a1', kind: 'member', clubId: 'c-1', version: 1, deleted: false, waiting: 0,
  fields: memberFields('u-ana', 'Ana Ferreira', awards),
});
// Invented award dates; currency rule: valid through the expiry date, lapsing with 30 days or fewer left.
const driver = { id: 'd', name: 'IRB driver award', qualifies: 'driver' as const, awardedOn: '2025-10-01', expiresOn: '2026-12-20' };
const crew = { id: 'c', name: 'IRB crew award', qualifies: 'crew' as const, awardedOn: '2024-10-01', expiresOn: '2026-11-30' };

describe('the award check at sign-on', () => {
  it('passes a current award, and says so', () => {
    expect(signOnVerdict(card([driver]), 'Ana Ferreira', 'driver', '2026-10-01', 'warn')).toMatchObject({
      level: 'ok', message: 'IRB driver award current: valid until 2026-12-20 (80 days).',
    });
  });

  it('passes a lapsing award with a reminder to renew', () => {
    expect(signOnVerdict(card([driver]), 'Ana Ferreira', 'driver', '2026-12-06', 'warn')).toMatchObject({
      level: 'lapsing', message: 'IRB driver award lapsing: valid until 2026-12-20 (14 days). Renew it before it expires.',
    });
  });

  it('warns by default when the award has expired, and blocks when the club chose to', () => {
    const warn = signOnVerdict(card([crew]), 'Ana Ferreira', 'crew', '2026-12-06', 'warn');
    expect(warn).toMatchObject({ level: 'warn', message: "No current award for crew on 2026-12-06: IRB crew award expired on 2026-11-30. Signing on anyway is the patrol captain's call." });
    expect(signOnVerdict(card([crew]), 'Ana Ferreira', 'crew', '2026-12-06', 'block')).toMatchObject({ level: 'block', message: expect.stringMatching(/requires a current award/) });
  });

  it('counts a driver award for crew, never a crew award for driving', () => {
    expect(signOnVerdict(card([driver]), 'Ana Ferreira', 'crew', '2026-10-01', 'block').level).toBe('ok');
    expect(signOnVerdict(card([crew]), 'Ana Ferreira', 'driver', '2026-10-01', 'warn')).toMatchObject({
      level: 'warn', message: expect.stringMatching(/no award on the member card qualifies for driving an IRB/),
    });
  });

  it('cannot check a member with no card on the phone, and says what to do', () => {
    expect(signOnVerdict(undefined, 'you', 'crew', '2026-10-01', 'warn')).toMatchObject({ level: 'warn', message: expect.stringMatching(/no member card for you/) });
    expect(signOnVerdict(undefined, 'you', 'crew', '2026-10-01', 'block').level).toBe('block');
  });
});
