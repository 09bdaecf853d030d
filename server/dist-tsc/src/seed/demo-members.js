import { addDays } from '@breakline/sync-protocol';
import { Club } from '../clubs/club.entity.js';
import { MemberCardsService } from '../clubs/member-cards.service.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { PushService } from '../sync/push.service.js';
import { DEMO_CLUBS } from './demo-scenario.js';
const driverAward = (id, awardedOn, expiresOn) => ({ id, name: 'IRB driver award', qualifies: 'driver', awardedOn, expiresOn });
const crewAward = (id, awardedOn, expiresOn) => ({ id, name: 'IRB crew award', qualifies: 'crew', awardedOn, expiresOn });
/** Each demo member's awards, by e-mail; `today` is the UTC date the demo is written. */
export function demoAwards(email, today) {
    const d = (offset) => addDays(today, offset);
    switch (email) {
        case 'admin@gannetbay.example': return [crewAward('crew-2023', d(-1130), d(-40))];
        case 'captain@gannetbay.example': return [driverAward('driver-2024', d(-700), d(400)), crewAward('crew-2019', d(-2500), null)];
        case 'driver@gannetbay.example': return [driverAward('driver-2024', d(-710), d(18)), crewAward('crew-2022', d(-1400), d(320))];
        case 'crew@gannetbay.example': return [crewAward('crew-2025', d(-260), d(470))];
        case 'admin@kelpreef.example': return [driverAward('driver-2025', d(-300), d(430))];
        case 'crew@kelpreef.example': return [crewAward('crew-2026', d(-30), d(700))];
        default: return [];
    }
}
/** A card for every demo membership, written through the member-cards service as an invitation would. */
export async function seedMemberCards(db, now = new Date()) {
    const cards = new MemberCardsService(db, new PushService(db));
    const today = now.toISOString().slice(0, 10);
    let written = 0;
    for (const demo of DEMO_CLUBS) {
        const club = await db.getRepository(Club).findOneOrFail({ where: { slug: demo.slug } });
        const admin = demo.members.find((m) => m.role === 'admin');
        const adminUser = await db.getRepository(User).findOneOrFail({ where: { email: admin.email } });
        for (const m of demo.members) {
            const user = await db.getRepository(User).findOneOrFail({ where: { email: m.email } });
            const membership = await db.getRepository(Membership).findOneOrFail({ where: { clubId: club.id, userId: user.id } });
            const r = await cards.upsertForMembership(membership.id, { awards: demoAwards(m.email, today), byUserId: adminUser.id });
            if (r.status !== 'unchanged')
                written++;
        }
    }
    return written;
}
//# sourceMappingURL=demo-members.js.map