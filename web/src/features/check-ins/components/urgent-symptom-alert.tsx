import { URGENT_SYMPTOM_MESSAGE } from '@driftmark/shared';
import { forwardRef } from 'react';
import { CautionIcon } from '@/components/ui/icons';

export const URGENT_ALERT_TITLE = 'Stop and seek medical care';

/**
 * The message an athlete gets the moment they report dizziness, fainting, palpitations or
 * confusion. It interrupts (role=alert) and stays on the day's screen.
 */
export const UrgentSymptomAlert = forwardRef<HTMLDivElement, { message?: string }>(
  function UrgentSymptomAlert({ message = URGENT_SYMPTOM_MESSAGE }, ref) {
    return (
      <div
        ref={ref}
        role="alert"
        aria-labelledby="urgent-symptom-title"
        tabIndex={-1}
        className="scroll-mt-20 rounded-lg border-2 border-off-plan bg-off-plan-soft px-4 py-4 shadow-card outline-none"
      >
        <p id="urgent-symptom-title" className="flex items-center gap-2 text-lg font-bold text-off-plan">
          <CautionIcon className="shrink-0 text-2xl" />
          {URGENT_ALERT_TITLE}
        </p>
        <p className="mt-2 text-base leading-relaxed font-medium text-ink">{message}</p>
      </div>
    );
  },
);
