import { currencyForRole, type RoleCurrency } from '@breakline/sync-protocol';
import type { LocalRecord } from '@/db/types';

export type SignOnRole = 'driver' | 'crew';

/**
 * What the phone says before a sign-on: `ok` (a current award), `lapsing` (current, renew soon),
 * `warn` (no current award: the person may still sign on, having read why), `block` (the club
 * refuses sign-on without a current award).
 */
export interface SignOnVerdict {
  level: 'ok' | 'lapsing' | 'warn' | 'block';
  message: string;
  currency: RoleCurrency | null;
}

const roleWord = (role: SignOnRole) => (role === 'driver' ? 'driver' : 'crew');

export function signOnVerdict(
  card: LocalRecord<'member'> | undefined, name: string, role: SignOnRole, date: string, rule: 'warn' | 'block',
): SignOnVerdict {
  const refuse = rule === 'block';
  if (!card) {
    return {
      level: refuse ? 'block' : 'warn',
      currency: null,
      message: `There is no member card for ${name} on this phone, so the award for ${roleWord(role)} cannot be checked.${refuse ? ' Your club requires a current award to sign on: ask a supervisor.' : ' Check the award with the patrol captain before signing on.'}`,
    };
  }
  const currency = currencyForRole(card.fields.awards, role, date);
  if (currency.current) {
    const level = currency.status === 'lapsing' ? 'lapsing' : 'ok';
    return { level, currency, message: level === 'lapsing' ? `${capital(currency.reason)}. Renew it before it expires.` : `${capital(currency.reason)}.` };
  }
  return {
    level: refuse ? 'block' : 'warn',
    currency,
    message: `No current award for ${roleWord(role)} on ${date}: ${currency.reason}.${refuse ? ' Your club requires a current award to sign on: ask a supervisor to update the member card.' : ' Signing on anyway is the patrol captain\'s call.'}`,
  };
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
