import type { TripPurpose } from '@breakline/sync-protocol';
export interface BoatHours {
    boatId: string;
    boatName: string | null;
    fleetNumber: string | null;
    totalHours: number;
    /** Hours of trips launched in each week of `weeks`, same order. */
    weekly: number[];
}
/** Defects reported in the week, and defects verified (returned to service) in the week, whenever raised. */
export interface DefectWeek {
    week: string;
    raised: number;
    returnedToService: number;
}
/** GET /api/reports/season: the season's figures, for the charts and the PDF alike. */
export interface SeasonReportDto {
    club: {
        id: string;
        name: string;
        timeZone: string;
    };
    /** Local dates at the club, inclusive. */
    from: string;
    to: string;
    generatedAt: string;
    /** The Monday (local date) of each week in the range, oldest first. */
    weeks: string[];
    hoursOnWater: {
        total: number;
        byBoat: BoatHours[];
    };
    trips: {
        total: number;
        open: number;
        byPurpose: Record<TripPurpose, number>;
    };
    defects: {
        raised: number;
        /** Of those raised in the range: verified (returned to service) or rejected. */
        closed: number;
        /** Median hours from report to repair over the defects raised in the range that have a repair time. */
        medianHoursToRepair: number | null;
        repairedCount: number;
        weekly: DefectWeek[];
    };
    rescues: {
        incidents: number;
        persons: number;
    };
    assists: {
        incidents: number;
        persons: number;
    };
}
