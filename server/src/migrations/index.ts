// Migrations are listed explicitly, oldest first (a glob can silently find none).
import { Foundation1796157054596 } from './1796157054596-Foundation.js';
import { SyncRecords1796161067131 } from './1796161067131-SyncRecords.js';
import { MotorMoveBy1796167010039 } from './1796167010039-MotorMoveBy.js';
import { PatrolMembers1796167034528 } from './1796167034528-PatrolMembers.js';
import { SupervisorDesk1796167688603 } from './1796167688603-SupervisorDesk.js';
import { ServiceParts1796170000000 } from './1796170000000-ServiceParts.js';
import { SyncRefusals1796180000000 } from './1796180000000-SyncRefusals.js';
import { DeviceOwner1796190000000 } from './1796190000000-DeviceOwner.js';

export const MIGRATIONS = [Foundation1796157054596, SyncRecords1796161067131, MotorMoveBy1796167010039, PatrolMembers1796167034528, SupervisorDesk1796167688603, ServiceParts1796170000000, SyncRefusals1796180000000, DeviceOwner1796190000000];
