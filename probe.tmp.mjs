import { chromium } from '@playwright/test';
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox','--disable-gpu','--disable-background-networking','--disable-component-update'] });
const context = await browser.newContext();
const a = await context.newPage();
a.on('console', (m) => console.log('A console:', m.type(), m.text()));
await a.goto('http://localhost:4325/');
await a.getByRole('status').filter({hasText: 'Up to date.'}).waitFor({timeout: 60000});

const b = await context.newPage();
await b.goto('http://localhost:4325/');
await b.getByRole('status').filter({hasText: 'Up to date.'}).waitFor({timeout: 60000});
await b.getByLabel('Safety factor on breaking load').fill('6');
await new Promise((r) => setTimeout(r, 2000));
console.log('A value', await a.getByLabel('Safety factor on breaking load').inputValue());
await b.getByLabel('Minimum clearance above ground (m)').fill('2.6'); await new Promise((r) => setTimeout(r, 1500)); console.log('A after 2nd', await a.getByLabel('Safety factor on breaking load').inputValue(), await a.getByLabel('Minimum clearance above ground (m)').inputValue());
await browser.close();
