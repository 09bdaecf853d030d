import { EntitySchema } from 'typeorm';
import { ALL_KINDS, fieldColumns, tableOf } from './columns.js';
import { REVIEW_INDICES } from './review-indices.js';
/**
 * One typed table a record kind. The sync columns are shared; the kind's fields come from its
 * schema in sync-protocol, so the table and the validation cannot drift apart.
 */
function kindEntity(kind) {
    const columns = {
        id: { type: 'uuid', primary: true },
        clubId: { name: 'club_id', type: 'uuid' },
        version: { type: 'int' },
        hlc: { type: 'text' },
        updatedAt: { name: 'updated_at', type: 'timestamptz' },
        updatedBy: { name: 'updated_by', type: 'uuid' },
        updatedRole: { name: 'updated_role', type: 'text', nullable: true },
        deviceId: { name: 'device_id', type: 'text' },
        deleted: { type: 'boolean', default: false },
        changeSeq: { name: 'change_seq', type: 'bigint' },
        fieldStamps: { name: 'field_stamps', type: 'jsonb', default: () => "'{}'" },
    };
    for (const c of fieldColumns(kind))
        columns[c.field] = { name: c.column, type: c.type, nullable: true };
    return new EntitySchema({
        name: `record_${kind}`,
        tableName: tableOf(kind),
        columns: columns,
        // Pull reads a club's records in change order after a checkpoint: this index is that scan.
        indices: [{ name: `ix_${tableOf(kind)}_changes`, columns: ['clubId', 'changeSeq'] }, ...(REVIEW_INDICES[kind] ?? [])],
    });
}
export const KIND_ENTITIES = ALL_KINDS.map(kindEntity);
//# sourceMappingURL=kind-entities.js.map