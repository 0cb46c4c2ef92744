import { chromium } from '@playwright/test';
const base = 'http://localhost:4413';
const out = process.env.OUT ?? '/tmp/shots';
const sizes = [[1366,768],[1920,1080]];
const browser = await chromium.launch({executablePath:'/usr/bin/chromium',args:['--no-sandbox','--disable-gpu','--disable-background-networking','--disable-component-update']});
const targets = [['demo',null],['blank-span','Blank span'],['garden-clothesline','Garden clothesline'],['courtyard-string-lights','Lights across a courtyard'],['trellis-over-posts','Trellis line over posts'],['yard-sign','Sign over a yard']];
const only = process.env.ONLY?.split(',');
for (const [id, name] of targets) for (const [w,h] of sizes) {
  if (only && !only.includes(id)) continue;
  const page = await browser.newPage({viewport:{width:w,height:h}});
  await page.goto(base);
  const status = page.getByRole('region', { name: 'Results', exact: true }).getByRole('status').first();
  await status.filter({hasText:'Up to date.'}).waitFor({timeout:60000});
  if (name) {
    await page.getByRole('button',{name:'File and export'}).click();
    await page.getByRole('button',{name:'New project…'}).click();
    if (id === 'blank-span' ) await page.screenshot({path:`${out}/dialog-new-${w}x${h}.png`});
    await page.getByRole('dialog',{name:'New project'}).getByRole('button',{name, exact:true}).click();
    await page.getByLabel('Project title').waitFor();
    await page.waitForTimeout(300);
    await status.filter({hasText:'Up to date.'}).waitFor({timeout:60000});
  }
  await page.getByRole('figure', { name: 'Sag plot' }).and(page.locator('[data-plot-state=drawn]')).waitFor({timeout:60000});
  await page.waitForTimeout(1500);
  // The menu's status line fades from view for the picture: click somewhere neutral.
  await page.screenshot({path:`${out}/${id}-${w}x${h}.png`});
  await page.screenshot({path:`${out}/${id}-${w}x${h}-full.png`, fullPage:true});
  await page.close();
}
await browser.close();
