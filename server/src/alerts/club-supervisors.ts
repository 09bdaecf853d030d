import type { EntityManager } from 'typeorm';

/** The addresses of a club's supervisors and admins: who alerts and digests go to. */
export function clubSupervisorEmails(em: Pick<EntityManager, 'query'>, clubId: string): Promise<{ email: string }[]> {
  return em.query(
    `SELECT u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.club_id = $1 AND m.role IN ('supervisor', 'admin') ORDER BY u.email`,
    [clubId],
  );
}
