import type { MailMessage } from '../mail/mail.types.js';
/** "2026-12-08 09:30 (Australia/Sydney)": a time as the club reads it. */
export declare function clubTime(at: Date, zone: string): string;
export declare function inviteMail(o: {
    to: string;
    clubName: string;
    inviter: string;
    role: string;
    link: string;
    expiresAt: Date;
    zone: string;
}): MailMessage;
export declare function resetMail(o: {
    to: string;
    name: string;
    link: string;
    minutes: number;
}): MailMessage;
