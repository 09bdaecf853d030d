// Migrations are listed explicitly, oldest first (a glob can silently find none).
import { Foundation1796157054596 } from './1796157054596-Foundation.js';
import { SyncRecords1796161067131 } from './1796161067131-SyncRecords.js';

export const MIGRATIONS = [Foundation1796157054596, SyncRecords1796161067131];
