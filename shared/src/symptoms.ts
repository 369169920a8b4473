/** Symptoms an athlete can report, and which of them stop the plan at once. */

export const SYMPTOMS = [
  'dizziness',
  'fainting',
  'palpitations',
  'muscle_cramps',
  'headache',
  'confusion',
  'dark_urine',
] as const;
export type Symptom = (typeof SYMPTOMS)[number];
export const SYMPTOM_LABELS: Record<Symptom, string> = {
  dizziness: 'Dizziness',
  fainting: 'Fainting or near-fainting',
  palpitations: 'Palpitations',
  muscle_cramps: 'Muscle cramps',
  headache: 'Headache',
  confusion: 'Confusion',
  dark_urine: 'Very dark urine',
};
/** Symptoms that stop the plan at once: the athlete is told to stop any restriction and seek care. */
export const URGENT_SYMPTOMS = [
  'dizziness',
  'fainting',
  'palpitations',
  'confusion',
] as const satisfies readonly Symptom[];
export const URGENT_SYMPTOM_MESSAGE =
  'Stop any fluid or food restriction now and seek medical care. If you fainted, feel confused or your ' +
  'heart is racing or irregular, call your local emergency number. Your coach has been notified.';
