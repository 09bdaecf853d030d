import { Club } from '../clubs/club.entity.js';
import { Membership } from '../clubs/membership.entity.js';
import { User } from '../users/user.entity.js';
import { RefreshToken } from '../auth/refresh-token.entity.js';

/** Every entity, listed once for the app module and the migration CLI. */
export const ENTITIES = [Club, User, Membership, RefreshToken];
