// Calendar dates: one implementation, in shared/src/calendar.ts.
export { addDays, isIsoDate } from '@driftmark/shared';
