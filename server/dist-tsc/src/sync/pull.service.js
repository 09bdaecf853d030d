var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
import { Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { canSee, formatCheckpoint, needsFreshStart, parseCheckpoint, PullQuerySchema, toWire, } from '@breakline/sync-protocol';
import { AppError } from '../common/app-error.js';
import { recordStore } from '../records/record-store.js';
/**
 * Pull: the club's records changed after a checkpoint, oldest change first, that the caller may
 * see. Checkpoints carry the purge horizon they were given under, so a fresh start below the
 * horizon goes on page after page while a replica from before the purge is sent back to the start.
 */
let PullService = class PullService {
    db;
    constructor(db) {
        this.db = db;
    }
    async pull(p, query) {
        const q = PullQuerySchema.safeParse(query);
        if (!q.success) {
            const details = q.error.issues.map((i) => ({ field: i.path.join('.') || 'query', message: i.message }));
            throw new AppError(400, 'validation_failed', 'The pull request is not valid.', details);
        }
        const since = parseCheckpoint(q.data.since);
        const limit = q.data.limit;
        // One snapshot for the horizon and the records: were a purge to commit between two separate
        // reads, a replica from before it would pass the check and then never see the purged deletes.
        return this.db.transaction('REPEATABLE READ', async (em) => {
            const [state] = await em.query('SELECT last_seq, purged_through_seq FROM sync_club_state WHERE club_id = $1', [p.clubId]);
            const horizon = Number(state?.purged_through_seq ?? 0);
            if (needsFreshStart(since, horizon)) {
                return { changes: [], checkpoint: formatCheckpoint({ horizon, seq: Number(state?.last_seq ?? 0) }), hasMore: false, resetRequired: true };
            }
            const rows = await recordStore.changedAfter(em, p.clubId, since.seq, limit);
            return this.page(p, rows, limit, horizon, since.seq);
        });
    }
    page(p, rows, limit, horizon, sinceSeq) {
        const page = rows.slice(0, limit);
        // Records the caller may not see still move the checkpoint on, so they are never asked for again.
        const changes = page.filter((r) => canSee(r.kind, p.role, r.fields, p.userId)).map(toWire);
        const seq = page.length ? page[page.length - 1].changeSeq : sinceSeq;
        return { changes, checkpoint: formatCheckpoint({ horizon, seq }), hasMore: rows.length > limit };
    }
};
PullService = __decorate([
    Injectable(),
    __metadata("design:paramtypes", [DataSource])
], PullService);
export { PullService };
//# sourceMappingURL=pull.service.js.map