import type { MailMessage } from '../mail/mail.types.js';
export interface StandDownFacts {
    to: string;
    clubName: string;
    zone: string;
    boat: string;
    description: string;
    reporter: string;
    reportedAt: string;
    status: string;
    motor: string | null;
    deskUrl: string;
}
export declare function standDownMail(f: StandDownFacts): MailMessage;
export interface LapsingAward {
    holder: string;
    award: string;
    expiresOn: string;
    daysLeft: number;
}
export declare function lapsingMail(to: string, clubName: string, a: LapsingAward): MailMessage;
export declare function lapsingDigest(to: string, clubName: string, awards: LapsingAward[]): MailMessage;
