import { useMemo } from 'react';
import { useRecords, useReplica } from '@/db/hooks';
import { useSession } from '@/features/auth/use-auth';
import { awardRule, clubPlace, clubWindUnit } from '../model/club-place';
import { cardsByMember, memberName } from '../model/members';

/** The club's place, rules and member cards, and who is looking: what every patrol screen needs. */
export function usePatrolContext() {
  const session = useSession();
  const ctx = useReplica();
  const cards = useRecords('member');
  const { activeClub, user } = session;
  return useMemo(() => {
    const byMember = cardsByMember(cards ?? []);
    return {
      ctx,
      loaded: cards !== undefined,
      place: clubPlace(activeClub),
      zone: activeClub.timeZone,
      windUnit: clubWindUnit(activeClub.windUnit),
      rule: awardRule(activeClub),
      role: activeClub.role,
      userId: user.id,
      clubName: activeClub.name,
      cards: byMember,
      cardList: cards ?? [],
      nameOf: (id: string) => memberName(byMember, id, user.id),
    };
  }, [ctx, cards, activeClub, user.id]);
}

export type PatrolContext = ReturnType<typeof usePatrolContext>;
