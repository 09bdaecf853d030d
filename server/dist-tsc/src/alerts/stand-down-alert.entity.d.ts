/**
 * A defect that has just begun to stand its boat down, written by a database trigger in the same
 * transaction as the defect, so no sync path can store one without its alert. The alert service
 * turns each into e-mails to the club's supervisors and marks it sent.
 */
export declare class StandDownAlert {
    id: string;
    clubId: string;
    defectId: string;
    /** The defect's version that stood the boat down. */
    defectVersion: number;
    createdAt: Date;
    sentAt: Date | null;
    /** How many people were mailed; 0 when mail is off or the club has no supervisor. */
    recipients: number | null;
}
