import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { RefreshToken } from '../auth/refresh-token.entity.js';
import { Change } from '../sync/change.entity.js';
import { ClubSyncState } from '../sync/club-sync-state.entity.js';
import { SyncDevice } from '../sync/device.entity.js';
import { SyncConflict } from '../sync/conflict.entity.js';
import { KIND_ENTITIES } from '../records/kind-entities.js';

/** Every entity, listed once for the app module and the migration CLI. */
export const ENTITIES = [Club, User, Membership, RefreshToken, Change, ClubSyncState, SyncDevice, SyncConflict, ...KIND_ENTITIES];
