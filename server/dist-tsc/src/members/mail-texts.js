import { utcToLocal } from '@breakline/sync-protocol';
/** "2026-12-08 09:30 (Australia/Sydney)": a time as the club reads it. */
export function clubTime(at, zone) {
    const l = utcToLocal(at, zone);
    return `${l.date} ${l.time} (${zone})`;
}
const ROLE_WORDS = { crew: 'crew', driver: 'a driver', supervisor: 'a supervisor', admin: 'an admin' };
export function inviteMail(o) {
    return {
        to: o.to,
        tag: 'invite',
        subject: `Join ${o.clubName} on Breakline`,
        text: [
            `${o.inviter} has invited you to join ${o.clubName} on Breakline as ${ROLE_WORDS[o.role] ?? o.role}.`,
            '',
            'Open this link to accept:',
            o.link,
            '',
            `The link works once and until ${clubTime(o.expiresAt, o.zone)}. If it has run out, ask your club admin for a new invitation.`,
            'If you already use Breakline with this address, sign in with your existing password on that page and the club is added to your account.',
            '',
            'If you were not expecting this, you can ignore this e-mail.',
        ].join('\n'),
    };
}
export function resetMail(o) {
    return {
        to: o.to,
        tag: 'password-reset',
        subject: 'Set a new Breakline password',
        text: [
            `Hello ${o.name},`,
            '',
            'Someone (we hope you) asked to set a new password for your Breakline account. Open this link to choose one:',
            o.link,
            '',
            `The link works once, for ${o.minutes} minutes. Setting a new password signs you out on your other devices.`,
            'If you did not ask for this, ignore this e-mail: your password stays as it is.',
        ].join('\n'),
    };
}
//# sourceMappingURL=mail-texts.js.map