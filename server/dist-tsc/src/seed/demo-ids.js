import { createHash } from 'node:crypto';
/** A stable uuid (version 7 layout) for a demo record, so seeding twice names the same records. */
export function demoId(name) {
    const h = createHash('sha256').update(`breakline-demo:${name}`).digest('hex');
    return `${h.slice(0, 8)}-${h.slice(8, 12)}-7${h.slice(13, 16)}-8${h.slice(17, 20)}-${h.slice(20, 32)}`;
}
//# sourceMappingURL=demo-ids.js.map