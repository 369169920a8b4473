/** The password every factory user has. */
export const FACTORY_PASSWORD = 'factory-password-1';

/**
 * bcrypt hash of FACTORY_PASSWORD, precomputed at cost 4 so factories and sign-ins stay fast.
 * The app hashes new passwords at cost 12 and verifies any cost.
 */
export const FACTORY_PASSWORD_HASH = '$2b$04$eWV4LxzF.s35b/s.efFV8uzR3RxGf8lXxFZEVAEkUuTvsehUcpcTe';
