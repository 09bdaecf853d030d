import { PROTOCOL_VERSION, SyncRequestError } from '@breakline/sync-protocol';
import { AppError, CODE_BY_STATUS } from '../common/app-error.js';
/** The shared rules throw SyncRequestError; the API answers with its usual error body. */
export function toAppError(e) {
    if (e instanceof SyncRequestError)
        return new AppError(e.httpStatus, CODE_BY_STATUS[e.httpStatus] ?? 'validation_failed', e.message);
    return e;
}
/** An outdated app gets 426 before anything else is read, so it updates and then syncs. */
export function assertProtocol(body) {
    const v = body?.protocolVersion;
    if (v !== PROTOCOL_VERSION) {
        throw new AppError(426, 'protocol_outdated', `This app speaks sync protocol ${String(v ?? 'unknown')}; the server speaks ${PROTOCOL_VERSION}. The app will update itself; then sync again.`);
    }
}
//# sourceMappingURL=sync-errors.js.map