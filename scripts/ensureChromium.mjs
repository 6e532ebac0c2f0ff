// Makes sure Debian's Chromium is present for the browser tests: installs it with apt-get when
// running as root on a Debian-like machine, otherwise explains what to do. Never downloads a
// browser build of its own.
import { existsSync } from 'node:fs';
import { execSync } from 'node:child_process';

const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (existsSync(path)) process.exit(0);
const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
if (isRoot && existsSync('/usr/bin/apt-get')) {
  console.log(`${path} is missing: installing Debian's chromium with apt-get…`);
  execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit' });
  if (existsSync(path)) process.exit(0);
}
console.error(`Browser tests need Chromium at ${path}. Install it (Debian: sudo apt-get install chromium) or set CHROMIUM_PATH.`);
process.exit(1);
