// Calendar dates: one implementation, in shared/src/calendar.ts (dayDiff is its daysBetween).
export { addDays, daysBetween as dayDiff, eachDay } from '@driftmark/shared';
