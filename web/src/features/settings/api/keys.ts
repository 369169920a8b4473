export const guardrailKeys = {
  /** The team's guardrail floors (GET /api/team/guardrails). */
  floors: ['team-guardrails'] as const,
};

export const notificationKeys = {
  /** The signed-in user's e-mail choices (GET /api/me/notifications). */
  preferences: ['me-notifications'] as const,
  /** What an unsubscribe link would stop (GET /api/unsubscribe?token=). */
  unsubscribe: (token: string) => ['unsubscribe', token] as const,
};

export const sessionKeys = {
  /** The signed-in user's devices (GET /api/me/sessions). */
  devices: ['me-sessions'] as const,
};

export const cutSettingKeys = {
  /** The team's acute-share threshold (GET /api/team/cut-settings). */
  threshold: ['team-cut-settings'] as const,
};
