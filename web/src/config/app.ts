export const APP_NAME = 'Driftmark';

/** How often the demo inbox looks for newly captured e-mails. */
export const DEV_INBOX_POLL_MS = 4_000;
