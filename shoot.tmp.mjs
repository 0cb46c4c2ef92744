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
    if (id === 'blank-span') {
      await page.getByRole('dialog',{name:'New project'}).waitFor();
      await page.screenshot({path:`${out}/dialog-new-${w}x${h}.png`});
    }
    await page.getByRole('dialog',{name:'New project'}).getByRole('button',{name, exact:true}).click();
    await page.getByLabel('Project title').waitFor();
    await page.waitForTimeout(300);
    await status.filter({hasText:'Up to date.'}).waitFor({timeout:60000});
  }
  await page.getByRole('figure', { name: 'Sag plot' }).and(page.locator('[data-plot-state=drawn]')).waitFor({timeout:60000});
  await page.waitForTimeout(1500);
  // The menu's status line fades from view for the picture: click somewhere neutral.
  await page.getByRole('button', { name: 'OK' }).click().catch(() => {});
  await page.mouse.move(0, 0);
  await page.waitForTimeout(500);
  await page.screenshot({path:`${out}/${id}-${w}x${h}.png`});
  if (id === 'demo') {
    await page.getByLabel('Project title').fill('My yard');
    await page.getByRole('button',{name:'File and export'}).click();
    await page.getByRole('button',{name:'New project…'}).click();
    await page.getByRole('dialog',{name:'New project'}).getByRole('button',{name:'Sign over a yard', exact:true}).click();
    await page.getByRole('alertdialog').waitFor();
    await page.screenshot({path:`${out}/dialog-confirm-${w}x${h}.png`});
    await page.keyboard.press('Escape');
    await page.keyboard.press('Escape');
    await page.getByLabel('Project title').fill('Courtyard festoon lights');
    await page.waitForTimeout(800);
  }
  await page.screenshot({path:`${out}/${id}-${w}x${h}-full.png`, fullPage:true});
  await page.close();
}
await browser.close();
