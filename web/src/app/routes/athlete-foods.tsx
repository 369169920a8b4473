import { Navigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { foodKeys } from '@/features/check-ins/api/keys';
import { PackagedFoodPanel } from '@/features/foods/components/packaged-food-panel';
import { useCurrentUser } from '../session';

/** The athlete adds a packaged food to their own list: by barcode, or from its nutrition label. */
export function AthleteFoodsRoute() {
  const me = useCurrentUser();
  if (!me.intakeComplete || !me.athleteId) return <Navigate to={paths.intake} replace />;
  return (
    <>
      <title>Add a food · Driftmark</title>
      <PageHeader
        title="Add a packaged food"
        description="Scan or type its barcode, or copy its nutrition label. Only you and your coaches see your foods."
      />
      <PackagedFoodPanel athleteId={me.athleteId} linkedKeys={[foodKeys.all]} />
    </>
  );
}
