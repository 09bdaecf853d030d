/**
 * Indexes for the Review desk's tables and the season report: a club's records by the time the
 * desk filters and sorts on, alone and per boat. Property names are the kinds' field names.
 */
export const REVIEW_INDICES = {
    check: [
        { name: 'ix_checks_review_time', columns: ['clubId', 'startedAt'] },
        { name: 'ix_checks_review_boat', columns: ['clubId', 'boatId', 'startedAt'] },
    ],
    trip: [
        { name: 'ix_trips_review_time', columns: ['clubId', 'launchedAt'] },
        { name: 'ix_trips_review_boat', columns: ['clubId', 'boatId', 'launchedAt'] },
    ],
    defect: [
        { name: 'ix_defects_review_time', columns: ['clubId', 'reportedAt'] },
        { name: 'ix_defects_review_boat', columns: ['clubId', 'boatId', 'reportedAt'] },
        { name: 'ix_defects_review_status', columns: ['clubId', 'status', 'reportedAt'] },
    ],
    incidentNote: [
        { name: 'ix_incident_notes_review_time', columns: ['clubId', 'occurredAt'] },
    ],
};
//# sourceMappingURL=review-indices.js.map