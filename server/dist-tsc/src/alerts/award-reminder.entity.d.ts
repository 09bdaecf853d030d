/** That a lapsing award was announced, so each award's expiry date is mailed about once. */
export declare class AwardReminder {
    id: string;
    clubId: string;
    /** The member card (its id is the membership's). */
    cardId: string;
    awardId: string;
    expiresOn: string;
    createdAt: Date;
}
