import { chromium } from '@playwright/test';
const [w, h, name, generate] = process.argv.slice(2);
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--disable-gpu', '--no-sandbox'] });
const page = await browser.newPage({ viewport: { width: Number(w), height: Number(h) } });
page.on('console', (m) => { if (m.type() === 'error') console.log('console:', m.text()); });
await page.goto('http://127.0.0.1:4332/');
await page.locator('[data-hydrated="true"]').waitFor();
await page.getByTestId('view-glass').click();
if (generate === '1') {
  const t0 = Date.now();
  await page.getByTestId('glass-generate').click();
  await page.getByTestId('glass-routing').waitFor();
  await page.screenshot({ path: `/tmp/glassui-${name}-busy.png` });
  await page.locator('[data-testid="glass-plan"][data-state="idle"]').waitFor({ timeout: 60000 });
  console.log('routing took', Date.now() - t0, 'ms; ', await page.getByTestId('glass-trace-count').textContent());
}
await page.screenshot({ path: `/tmp/glassui-${name}.png` });
await browser.close();
