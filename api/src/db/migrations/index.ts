import type { MigrationInterface } from 'typeorm';
import { InitialSchema1796162777444 } from './1796162777444-InitialSchema.js';
import { AddDailyCheckIns1796164991456 } from './1796164991456-AddDailyCheckIns.js';
import { AddConditionPhotos1796165060504 } from './1796165060504-AddConditionPhotos.js';
import { AddPlans1796173077550 } from './1796173077550-AddPlans.js';
import { AddMarksAndReviews1796175671267 } from './1796175671267-AddMarksAndReviews.js';
import { AddWeeklyCheckInsAndNotifications1796178387090 } from './1796178387090-AddWeeklyCheckInsAndNotifications.js';
import { AddRateLimitCounters1796190000000 } from './1796190000000-AddRateLimitCounters.js';
import { OutboxSendingLease1796190000001 } from './1796190000001-OutboxSendingLease.js';
import { AddWeightCuts1796200000000 } from './1796200000000-AddWeightCuts.js';
import { AddBodyMeasurements1796190140000 } from './1796190140000-AddBodyMeasurements.js';
import { AddFoodLabels1796210000000 } from './1796210000000-AddFoodLabels.js';
import { AddCutRehearsals1796220000000 } from './1796220000000-AddCutRehearsals.js';
import { AddFluidSodium1796230000000 } from './1796230000000-AddFluidSodium.js';
import { AddMealEntryItems1796240000000 } from './1796240000000-AddMealEntryItems.js';
import { AddPlannedMealToMeals1796250000000 } from './1796250000000-AddPlannedMealToMeals.js';

/** Every migration in order, imported explicitly (a glob fails under vitest and in dist). */
export const MIGRATIONS: (new () => MigrationInterface)[] = [
  InitialSchema1796162777444,
  AddDailyCheckIns1796164991456,
  AddConditionPhotos1796165060504,
  AddPlans1796173077550,
  AddMarksAndReviews1796175671267,
  AddWeeklyCheckInsAndNotifications1796178387090,
  AddRateLimitCounters1796190000000,
  OutboxSendingLease1796190000001,
  AddWeightCuts1796200000000,
  AddBodyMeasurements1796190140000,
  AddFoodLabels1796210000000,
  AddCutRehearsals1796220000000,
  AddFluidSodium1796230000000,
  AddMealEntryItems1796240000000,
  AddPlannedMealToMeals1796250000000,
];
