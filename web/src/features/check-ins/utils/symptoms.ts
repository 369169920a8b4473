import { URGENT_SYMPTOMS, type DayView, type Symptom } from '@driftmark/shared';

const URGENT = new Set<Symptom>(URGENT_SYMPTOMS);

/** Whether a report names a symptom that stops the plan (the athlete is told to seek care at once). */
export function hasUrgentSymptom(symptoms: readonly Symptom[]): boolean {
  return symptoms.some((s) => URGENT.has(s));
}

/** Whether any report of the day was urgent (from the server's flag, or the symptoms themselves). */
export function dayHasUrgentSymptom(day: Pick<DayView, 'symptoms'>): boolean {
  return day.symptoms.some((r) => r.urgent || hasUrgentSymptom(r.symptoms));
}
