import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { DEMO_CLUBS, DEMO_PASSWORD } from './demo-scenario.js';

/** Writes the demo scenario; running it again changes nothing that is already there. */
export async function seedDemo(db: DataSource): Promise<{ created: number }> {
  let created = 0;
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  await db.transaction(async (tx) => {
    for (const demo of DEMO_CLUBS) {
      const { members, ...fields } = demo;
      let club = await tx.findOne(Club, { where: { slug: demo.slug } });
      if (!club) { club = await tx.save(tx.create(Club, fields)); created++; }
      for (const m of members) {
        let user = await tx.findOne(User, { where: { email: m.email } });
        if (!user) { user = await tx.save(tx.create(User, { email: m.email, displayName: m.displayName, passwordHash: hash })); created++; }
        const has = await tx.findOne(Membership, { where: { clubId: club.id, userId: user.id } });
        if (!has) { await tx.save(tx.create(Membership, { clubId: club.id, userId: user.id, role: m.role })); created++; }
      }
    }
  });
  return { created };
}
