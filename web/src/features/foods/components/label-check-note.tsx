import type { LabelFoodResult } from '@driftmark/shared';
import { Alert } from '@/components/ui/alert';
import { formatNumber } from '@/lib/format';

const NBSP = '\u00a0';

/**
 * A saved label or barcode food: its name and figures per 100 g, and the server's label check
 * (a caution when the printed energy is off its macros). Renders the server's verdict as sent.
 */
export function LabelCheckNote({ result, title }: { result: LabelFoodResult; title: string }) {
  const { food, labelCheck } = result;
  const p = food.per100g;
  return (
    <div className="space-y-3" data-testid="label-food-result">
      <Alert tone="success" title={title} live>
        <p className="font-semibold">{food.name}</p>
        <p className="tabular-nums">
          Per 100{NBSP}g: {formatNumber(labelCheck.printedKcal, 0)}
          {NBSP}kcal on the label · protein {formatNumber(p.proteinG, 1)}
          {NBSP}g · carbohydrate {formatNumber(p.carbohydrateG, 1)}
          {NBSP}g · fat {formatNumber(p.fatG, 1)}
          {NBSP}g{p.fibreG !== null ? ` · fibre ${formatNumber(p.fibreG, 1)}${NBSP}g` : ''}
          {p.sodiumMg !== null ? ` · sodium ${formatNumber(p.sodiumMg, 0)}${NBSP}mg` : ''}
        </p>
        {food.barcode ? <p className="text-sm text-ink-muted tabular-nums">Barcode {food.barcode}</p> : null}
      </Alert>
      {labelCheck.warning ? (
        <Alert tone="caution" title="Check the label" live>
          {labelCheck.warning}
        </Alert>
      ) : null}
    </div>
  );
}
