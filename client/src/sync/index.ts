import { checkForUpdate } from '@/app/pwa';
import { openReplica } from '@/db/open';
import { sessionAuth } from './auth-source';
import { SyncRunner } from './runner';

/** The app's one sync runner, bound to the signed-in session. */
export const syncRunner = new SyncRunner({ auth: sessionAuth, openDb: openReplica, onOutdated: checkForUpdate });
