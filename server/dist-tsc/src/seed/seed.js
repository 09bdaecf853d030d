import bcrypt from 'bcryptjs';
import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { DEMO_CLUBS, DEMO_PASSWORD } from './demo-scenario.js';
import { seedDemoRecords } from './demo-records.js';
import { seedMemberCards } from './demo-members.js';
/** Writes the demo scenario; running it again changes nothing that is already there. */
export async function seedDemo(db) {
    let created = 0;
    const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
    await db.transaction(async (tx) => {
        for (const demo of DEMO_CLUBS) {
            const { members, ...fields } = demo;
            let club = await tx.findOne(Club, { where: { slug: demo.slug } });
            if (!club) {
                club = await tx.save(tx.create(Club, fields));
                created++;
            }
            for (const m of members) {
                let user = await tx.findOne(User, { where: { email: m.email } });
                if (!user) {
                    user = await tx.save(tx.create(User, { email: m.email, displayName: m.displayName, passwordHash: hash }));
                    created++;
                }
                const has = await tx.findOne(Membership, { where: { clubId: club.id, userId: user.id } });
                if (!has) {
                    await tx.save(tx.create(Membership, { clubId: club.id, userId: user.id, role: m.role }));
                    created++;
                }
            }
        }
    });
    created += await seedMemberCards(db);
    created += await seedGannetBayRecords(db);
    return { created };
}
/** The first demo club gets a fleet and its history; the second stays empty, as a new club is. */
async function seedGannetBayRecords(db) {
    const club = await db.getRepository(Club).findOneOrFail({ where: { slug: 'gannet-bay' } });
    const id = async (email) => (await db.getRepository(User).findOneOrFail({ where: { email } })).id;
    return seedDemoRecords(db, club.id, {
        admin: await id('admin@gannetbay.example'), captain: await id('captain@gannetbay.example'),
        driver: await id('driver@gannetbay.example'), crew: await id('crew@gannetbay.example'),
    });
}
//# sourceMappingURL=seed.js.map