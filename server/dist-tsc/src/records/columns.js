import { KIND_SPECS, RECORD_KINDS } from '@breakline/sync-protocol';
function sqlTypeOf(t) {
    const def = t._zod.def;
    if (def.type === 'nullable')
        return { ...sqlTypeOf(def.innerType), nullable: true };
    if (def.type === 'optional' || def.type === 'default')
        return { ...sqlTypeOf(def.innerType), optional: true };
    const plain = { nullable: false, optional: false };
    if (def.type === 'string' || def.type === 'enum')
        return { type: 'text', ...plain };
    if (def.type === 'number')
        return { type: 'double precision', ...plain };
    if (def.type === 'boolean')
        return { type: 'boolean', ...plain };
    return { type: 'jsonb', ...plain }; // arrays, objects, records, unions
}
export const snake = (s) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
/** Table of a kind: defect → defects, checkTemplate → check_templates. */
export const tableOf = (kind) => `${snake(kind)}s`;
const cache = new Map();
/** The kind's own fields as columns, in schema order. */
export function fieldColumns(kind) {
    let cols = cache.get(kind);
    if (!cols) {
        const shape = KIND_SPECS[kind].schema.shape;
        cols = Object.entries(shape).map(([field, t]) => ({ field, column: snake(field), ...sqlTypeOf(t) }));
        cache.set(kind, cols);
    }
    return cols;
}
export const ALL_KINDS = RECORD_KINDS;
//# sourceMappingURL=columns.js.map