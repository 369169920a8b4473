import { LIMITS, RELAXED_POSES } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import { PoseRepository } from '../repositories/pose.repository.js';

const key = (pose: string) => pose.trim().toLocaleLowerCase('en');

/**
 * The team's own poses, cleaned: trimmed, inner spaces collapsed, repeats (ignoring case) and the
 * three relaxed poses dropped, at most LIMITS.posesPerTeam.
 */
export function cleanPoses(poses: readonly string[]): string[] {
  const seen = new Set<string>(RELAXED_POSES.map(key));
  const out: string[] = [];
  for (const raw of poses) {
    const pose = raw.trim().replace(/\s+/g, ' ');
    if (pose.length < LIMITS.poseName.min || seen.has(key(pose))) continue;
    seen.add(key(pose));
    out.push(pose);
  }
  return out.slice(0, LIMITS.posesPerTeam);
}

/** Every pose a team's athletes can choose: the three relaxed poses, then the team's list. */
export async function teamPoses(manager: EntityManager, teamId: string): Promise<string[]> {
  return [...RELAXED_POSES, ...cleanPoses(await new PoseRepository(manager).listForTeam(teamId))];
}

/** The team's spelling of `pose` (matched ignoring case and outer spaces), or null if it has none. */
export async function findTeamPose(
  manager: EntityManager,
  teamId: string,
  pose: string,
): Promise<string | null> {
  const wanted = key(pose.replace(/\s+/g, ' '));
  return (await teamPoses(manager, teamId)).find((p) => key(p) === wanted) ?? null;
}

export class PoseService {
  constructor(private readonly deps: { dataSource: DataSource }) {}

  list(teamId: string): Promise<string[]> {
    return teamPoses(this.deps.dataSource.manager, teamId);
  }

  /** Replaces the team's list; photos keep the pose they were taken with. */
  async replace(teamId: string, poses: readonly string[]): Promise<string[]> {
    const { manager } = this.deps.dataSource;
    await new PoseRepository(manager).replace(teamId, cleanPoses(poses));
    return teamPoses(manager, teamId);
  }
}
