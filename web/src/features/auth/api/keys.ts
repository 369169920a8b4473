export const authKeys = {
  all: ['auth'] as const,
  /** The signed-in user (null when signed out). */
  me: ['auth', 'me'] as const,
};
