import type { LocalRecord } from '@/db/types';

export type MemberCards = ReadonlyMap<string, LocalRecord<'member'>>;

/** Cards by the id trips and sign-ons name members by. */
export function cardsByMember(cards: readonly LocalRecord<'member'>[]): MemberCards {
  return new Map(cards.map((c) => [c.fields.memberId, c]));
}

/** A member as the person reading knows them: "you", the name on their card, or "a club member". */
export function memberName(cards: MemberCards, memberId: string, selfId: string): string {
  if (memberId === selfId) return 'you';
  return cards.get(memberId)?.fields.displayName ?? 'a club member';
}

/** Names in a list: "Sam Whitcombe and you", "A, B and C". */
export function namesList(names: readonly string[]): string {
  if (names.length <= 1) return names[0] ?? 'nobody';
  return `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}
