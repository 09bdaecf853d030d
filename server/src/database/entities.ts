import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { RefreshToken } from '../auth/refresh-token.entity.js';
import { Change } from '../sync/change.entity.js';
import { ClubSyncState } from '../sync/club-sync-state.entity.js';
import { SyncDevice } from '../sync/device.entity.js';
import { SyncRefusal } from '../sync/refusal.entity.js';
import { SyncConflict } from '../sync/conflict.entity.js';
import { KIND_ENTITIES } from '../records/kind-entities.js';
import { Invite } from '../members/invite.entity.js';
import { PasswordReset } from '../members/password-reset.entity.js';
import { ReportJob } from '../reports/report-job.entity.js';
import { StandDownAlert } from '../alerts/stand-down-alert.entity.js';
import { AwardReminder } from '../alerts/award-reminder.entity.js';

/** Every entity, listed once for the app module and the migration CLI. */
export const ENTITIES = [Club, User, Membership, RefreshToken, Change, ClubSyncState, SyncDevice, SyncRefusal, SyncConflict, ...KIND_ENTITIES,
  Invite, PasswordReset, ReportJob, StandDownAlert, AwardReminder];
