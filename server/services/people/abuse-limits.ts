// How much mail one sender, one address and one network address may cause. The per-sender and
// per-address counts are read from the invitations and password_resets rows themselves, so they
// hold across any number of API instances; the per-IP limits (express-rate-limit, in the routes)
// are kept in each instance's memory.
export const INVITES_PER_SENDER_PER_HOUR = 20;
export const INVITES_PER_ADDRESS_PER_DAY = 3;
/** Past this, a "forgot password" answers the same but sends nothing (so the answer tells nobody whether the account exists). */
export const RESETS_PER_ACCOUNT_PER_HOUR = 3;
export const IP_WINDOW_MS = 15 * 60 * 1000;
export const INVITES_PER_IP = 30;
export const RESETS_PER_IP = 10;
/** Opening and accepting links, resets and password changes (guessing a 256-bit token is hopeless, but cheap to stop). */
export const LINK_USES_PER_IP = 30;

export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;

/** Sign-in attempts per address (from any number of networks) and per network address, per IP_WINDOW_MS. */
export const SIGNINS_PER_ADDRESS = 20;
export const SIGNINS_PER_IP = 200;
/** "Create an account" per address per hour (past it the answer is the same but nothing is sent) and per network address. */
export const REGISTRATIONS_PER_ADDRESS_PER_HOUR = 3;
export const REGISTRATIONS_PER_IP = 20;
export const REGISTRATION_HOURS = 24;
