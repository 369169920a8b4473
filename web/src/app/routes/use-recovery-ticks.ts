import { createFluid } from '@/features/check-ins/api/create-fluid';
import { createMeal } from '@/features/check-ins/api/create-meal';
import { useDayCache } from '@/features/check-ins/api/day-cache';
import { deleteFluid } from '@/features/check-ins/api/delete-fluid';
import { deleteMeal } from '@/features/check-ins/api/delete-meal';
import type { RecoveryToggle } from '@/features/cuts/components/recovery-checklist';

/**
 * Ticking the recovery checklist through the check-in write path, logged like any day: a fluid
 * item posts a fluid entry with its sodium, a carbohydrate item a meal of macros, each with the item's client id
 * from the server (a double tap returns the first entry); unticking deletes the entry the server
 * names. Entries land on the athlete's `today` at the time given; the day cache then fetches the
 * day and what the app links to it (the checklist among them) again.
 */
export function useRecoveryTicks(athleteId: string, today: string): RecoveryToggle {
  const cache = useDayCache(athleteId);
  return async ({ slot, kind, time }) => {
    const logged = slot[kind].logged;
    if (kind === 'fluid') {
      if (logged) {
        await deleteFluid(athleteId, logged.entryId);
        await cache.removed(logged.date, 'fluids', logged.entryId);
      } else {
        const entry = await createFluid(athleteId, today, {
          clientId: slot.fluid.clientId,
          time,
          volume: slot.fluid.volumeMl,
          unit: 'ml',
          kind: 'other',
          sodiumMg: slot.fluid.sodiumMg,
        });
        await cache.entry(today, 'fluids', entry);
      }
    } else if (logged) {
      await deleteMeal(athleteId, logged.entryId);
      await cache.removed(logged.date, 'meals', logged.entryId);
    } else {
      const entry = await createMeal(athleteId, today, {
        clientId: slot.carbohydrate.clientId,
        time,
        name: slot.carbohydrate.mealName,
        source: 'macros',
        proteinG: 0,
        carbohydrateG: slot.carbohydrate.carbohydrateG,
        fatG: 0,
      });
      await cache.entry(today, 'meals', entry);
    }
  };
}
