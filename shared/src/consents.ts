/**
 * Texts an athlete agrees to at intake. The version is stored with the time of agreement;
 * changing a text means a new version.
 */
export const CONSENTS = {
  safety_acknowledgement: {
    version: '2026-12-01',
    text:
      'I understand that Driftmark and the plans my coach writes in it are not medical advice. ' +
      'I have medical clearance to train and diet, and I will set aggressive deficits, final-week ' +
      'or weigh-in protocols with a licensed physician or registered dietitian and within my ' +
      'federation or commission rules.',
  },
  photo_consent: {
    version: '2026-12-01',
    text:
      'I agree that condition photos I upload are stored for my coaching team to see. ' +
      'I can delete them, and they leave with my account.',
  },
} as const;
export type ConsentKind = keyof typeof CONSENTS;

/** Standing note shown on athlete and coach screens. */
export const SAFETY_NOTE =
  'Estimates only, not medical advice. Consult a licensed physician or registered dietitian ' +
  'before aggressive deficits, final-week or weigh-in protocols, and follow your federation or ' +
  'commission rules.';

/** Standing words on every countdown day and every day with an acknowledged warning. */
export const STOP_SIGNS_TEXT =
  'Stop and seek medical care at once if you feel dizzy, faint, have palpitations or feel confused.';
export const NOT_MEDICAL_ADVICE_TEXT =
  'This plan is not medical advice. Set it with a licensed physician or registered dietitian and ' +
  'within your federation or commission rules.';
