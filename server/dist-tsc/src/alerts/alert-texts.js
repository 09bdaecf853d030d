import { clubTime } from '../members/mail-texts.js';
const short = (s, n) => (s.length > n ? `${s.slice(0, n - 1)}…` : s);
export function standDownMail(f) {
    return {
        to: f.to,
        tag: 'stand-down',
        subject: `Stood down: ${f.boat} — ${short(f.description.replace(/\s+/g, ' '), 70)}`,
        text: [
            `${f.boat} at ${f.clubName} is stood down: a stand-down defect has been reported.`,
            '',
            `What is wrong: ${f.description}`,
            `Reported by: ${f.reporter}, ${clubTime(new Date(f.reportedAt), f.zone)}`,
            ...(f.motor ? [`Motor: ${f.motor}`] : []),
            `Status: ${f.status}`,
            '',
            'The boat is not to be launched until a competent person has repaired it and a supervisor has returned it to service.',
            "The club's procedures, the manufacturer's manual and the patrol captain's call come first.",
            '',
            `Assign the repair on Breakline's Review desk: ${f.deskUrl}`,
        ].join('\n'),
    };
}
const days = (n) => (n === 0 ? 'today is its last valid day' : n === 1 ? '1 day left' : `${n} days left`);
export function lapsingMail(to, clubName, a) {
    return {
        to,
        tag: 'award-lapsing',
        subject: `Your ${a.award} lapses on ${a.expiresOn}`,
        text: [
            `Your ${a.award} award at ${clubName} is valid until ${a.expiresOn} (${days(a.daysLeft)}).`,
            '',
            'Book a requalification with your club before then: after that date Breakline shows the award as expired when you sign on to a boat.',
            "Your club's and your governing body's rules decide what you may do without a current award.",
        ].join('\n'),
    };
}
export function lapsingDigest(to, clubName, awards) {
    return {
        to,
        tag: 'award-lapsing',
        subject: `${awards.length === 1 ? '1 award lapses' : `${awards.length} awards lapse`} within 30 days at ${clubName}`,
        text: [
            `These members' awards at ${clubName} lapse within the next 30 days:`,
            '',
            ...awards.map((a) => `- ${a.holder}: ${a.award}, valid until ${a.expiresOn} (${days(a.daysLeft)})`),
            '',
            'The Crew awards list in Breakline shows every member\'s awards and their dates.',
        ].join('\n'),
    };
}
//# sourceMappingURL=alert-texts.js.map