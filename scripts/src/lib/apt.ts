import { hasCommand, runChecked } from './proc.js';
import { log } from './log.js';

let updated = false;

export function isRoot(): boolean {
  return process.getuid?.() === 0;
}

/**
 * Installs Debian packages with apt-get (running `apt-get update` once per process first). Needs root
 * and apt-get; otherwise throws an error that says what to install by hand.
 */
export async function aptInstall(packages: readonly string[], why: string): Promise<void> {
  const manual = `apt-get install -y --no-install-recommends ${packages.join(' ')}`;
  if (!isRoot()) {
    throw new Error(`${why}. Install it as root (${manual}) or run this command as root.`);
  }
  if (!(await hasCommand('apt-get'))) {
    throw new Error(
      `${why}, and apt-get is not available to install it: install ${packages.join(', ')} by hand.`,
    );
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!updated) {
    log('apt-get update');
    await runChecked('apt-get', ['update'], { env });
    updated = true;
  }
  log(`${why}: ${manual}`);
  await runChecked('apt-get', ['install', '-y', '--no-install-recommends', ...packages], { env });
}
