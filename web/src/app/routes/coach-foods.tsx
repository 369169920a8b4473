import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { foodKeys } from '@/features/check-ins/api/keys';
import { LabelFoodForm } from '@/features/foods/components/label-food-form';

/** Staff add a team food from a nutrition label (every athlete of the team finds it). */
export function CoachFoodsRoute() {
  return (
    <>
      <title>Team food · Driftmark</title>
      <PageHeader
        title="Add a team food"
        description="Copy a nutrition label, per 100 g or per serving. Every athlete of the team can log it."
      />
      <Card>
        <LabelFoodForm owner={{ kind: 'team' }} linkedKeys={[foodKeys.all]} />
      </Card>
    </>
  );
}
