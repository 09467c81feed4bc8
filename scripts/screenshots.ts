// Screenshots of the main pages at phone, tablet and wall-screen sizes, to look at after a change.
// Usage: BASE_URL=http://localhost:3000 npx tsx scripts/screenshots.ts [path …]
import fs from 'node:fs';
import { chromium } from '@playwright/test';

const base = process.env.BASE_URL ?? 'http://localhost:3000';
const out = '.data/screenshots';
const sizes = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'tablet', width: 1024, height: 768 },
  { name: 'wall', width: 1920, height: 1080 },
];
const pages = process.argv.slice(2).length > 0 ? process.argv.slice(2) : ['/sign-in', '/', '/team'];
const email = process.env.SIGN_IN_AS ?? 'margaret@fennick.example';

fs.mkdirSync(out, { recursive: true });
const browser = await chromium.launch({
  executablePath: '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage', '--disable-background-networking', '--disable-component-update', '--no-first-run'],
});
for (const size of sizes) {
  const context = await browser.newContext({ viewport: { width: size.width, height: size.height }, baseURL: base });
  const page = await context.newPage();
  await page.request.post('/api/auth/sign-in', { data: { email, password: process.env.PASSWORD ?? 'keybed-demo' } });
  for (const path of pages) {
    if (path === '/sign-in') await context.clearCookies();
    await page.goto(path);
    await page.waitForLoadState('networkidle');
    const file = `${out}/${size.name}${path.replace(/[^a-z0-9]+/gi, '-')}.png`;
    await page.screenshot({ path: file, fullPage: true });
    console.log(file);
    if (path === '/sign-in') await page.request.post('/api/auth/sign-in', { data: { email, password: process.env.PASSWORD ?? 'keybed-demo' } });
  }
  await context.close();
}
await browser.close();
