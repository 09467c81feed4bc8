// Installs Debian packages when we are root; otherwise says what to install.
import { isRoot, run, say } from './proc.mjs';

let updated = false;

export async function aptInstall(packages, why) {
  if (!isRoot()) {
    throw new Error(`${why} is missing. Install it with: sudo apt-get install -y ${packages.join(' ')}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!updated) {
    say('apt-get update…');
    await run('apt-get', ['update', '-qq'], { env });
    updated = true;
  }
  say(`Installing ${packages.join(', ')} (${why})…`);
  await run('apt-get', ['install', '-y', '-qq', '--no-upgrade', ...packages], { env });
}
