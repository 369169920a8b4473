import type { DayView } from '@driftmark/shared';
import { cn } from '@/lib/cn';
import type { DayCardProps } from './day-card-props';
import { EveningCard } from './evening-card';
import { FluidsCard } from './fluids-card';
import { MealsCard } from './meals-card';
import { PlannedMealsCard } from './planned-meals-card';
import { SupplementsCard } from './supplements-card';
import { SymptomsCard } from './symptoms-card';
import { WeighInCard } from './weigh-in-card';

interface DayEntryCardsProps extends DayCardProps {
  layout: 'stack' | 'grid';
  /** Yesterday's supplements, offered again today. */
  previous: DayView['supplements'] | undefined;
  onUrgent: (message?: string) => void;
}

/**
 * The day's forms, weigh-in to symptoms, in their own chunk (with the form library and the
 * request schemas): day-check-in.tsx draws the day's caution and targets without waiting for them.
 */
export function DayEntryCards({ layout, previous, onUrgent, ...props }: DayEntryCardsProps) {
  return (
    <div className={cn(layout === 'grid' ? 'grid items-start gap-4 lg:grid-cols-2' : 'space-y-4')}>
      <WeighInCard {...props} />
      <FluidsCard {...props} />
      <PlannedMealsCard {...props} />
      <MealsCard {...props} />
      <SupplementsCard {...props} previous={previous} />
      <EveningCard {...props} />
      <SymptomsCard {...props} onUrgent={onUrgent} />
    </div>
  );
}
