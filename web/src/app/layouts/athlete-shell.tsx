import { Outlet } from 'react-router';
import { BottomBar, BottomBarLink, BottomBarShell, BrandMark } from '@/components/ui/app-shell';
import { CameraIcon, HistoryIcon, SlidersIcon, TodayIcon, TrendIcon } from '@/components/ui/icons';
import { paths } from '@/config/paths';
import { useUnreadMarkCount } from '@/features/marks/api/list-marks';
import { UnreadMarksBadge } from '@/features/marks/components/mark-badges';
import { useCurrentUser } from '../session';
import { SignOutButton } from './sign-out-button';

/**
 * Athlete screens: phone first, one-handed. The bottom bar (Today, History, Trends, Photos, Settings)
 * appears once the intake is done, so the intake has the athlete's full attention.
 */
export function AthleteShell() {
  const me = useCurrentUser();
  const unreadMarks = useUnreadMarkCount(me.intakeComplete ? (me.athleteId ?? '') : '');
  return (
    <BottomBarShell
      header={
        <>
          <BrandMark to={me.intakeComplete ? paths.athleteHome : paths.intake} />
          <SignOutButton />
        </>
      }
      nav={
        me.intakeComplete ? (
          <BottomBar label="Athlete">
            <BottomBarLink to={paths.athleteHome} icon={<TodayIcon />} end>
              Today
            </BottomBarLink>
            <BottomBarLink to={paths.athleteHistory} icon={<HistoryIcon />} alsoActiveOn="/athlete/days/">
              History
            </BottomBarLink>
            <BottomBarLink to={paths.athleteTrends} icon={<TrendIcon />}>
              Trends
              <UnreadMarksBadge count={unreadMarks} className="absolute top-1.5 left-[calc(50%+0.4rem)]" />
            </BottomBarLink>
            <BottomBarLink to={paths.athletePhotos} icon={<CameraIcon />}>
              Photos
            </BottomBarLink>
            <BottomBarLink to={paths.settings} icon={<SlidersIcon />}>
              Settings
            </BottomBarLink>
          </BottomBar>
        ) : null
      }
    >
      <Outlet />
    </BottomBarShell>
  );
}
