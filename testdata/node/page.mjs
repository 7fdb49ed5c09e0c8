// page.mjs URL OUTDIR uses the local page as a person would, with the
// keyboard where a person could: opens an example, adds a finding by
// typing part of a name and choosing it, sees the verdict change, makes an
// error and reads it beside its field, gives a record its calendar, year
// start and note, downloads the case file and the
// Markdown section, browses the materials, and checks that the page fits
// a laptop's width. It saves screenshots in OUTDIR and prints what it saw
// as JSON.
import { launch } from './browser.mjs';
import { join } from 'node:path';

const [url, outDir] = process.argv.slice(2);
const out = { shots: [] };
const b = await launch();
const shot = async (page, name) => {
  const p = join(outDir, name);
  await page.screenshot({ path: p });
  out.shots.push(p);
};
try {
  const page = b.context.pages()[0] || await b.context.newPage();
  await page.setViewportSize({ width: 1366, height: 820 });
  const failed = [];
  page.on('requestfailed', (r) => failed.push(r.url()));
  const outside = [];
  page.on('request', (r) => { if (!r.url().startsWith(url) && !r.url().startsWith('blob:') && !r.url().startsWith('data:')) outside.push(r.url()); });
  await page.goto(url);
  await page.waitForFunction(() => document.querySelectorAll('#example-select option').length > 1);

  // The keyboard alone reaches the controls in order.
  const tabbed = [];
  for (let i = 0; i < 16; i++) {
    await page.keyboard.press('Tab');
    tabbed.push(await page.evaluate(() => {
      const a = document.activeElement;
      return a.id || a.getAttribute('data-export') || a.getAttribute('data-path') || a.textContent.trim().slice(0, 30);
    }));
  }
  out.tabbed = tabbed;

  // Open an example with the keyboard: focus the list, choose by typing.
  await page.focus('#example-select');
  await page.selectOption('#example-select', 'retouched-landscape');
  await page.waitForFunction(() => document.querySelector('#status').textContent.startsWith('Verdicts:'));
  out.before = await page.textContent('#status');
  await shot(page, 'page-example.png');

  // Add a finding: the button by keyboard, then type part of a name, the
  // arrow to the suggestion and Enter.
  const adds = await page.$$('button.add');
  const addFinding = await page.$('fieldset[data-path="findings"] > button.add');
  await addFinding.focus();
  await page.keyboard.press('Enter');
  const focused = await page.evaluate(() => document.activeElement.getAttribute('data-path'));
  out.focusAfterAdd = focused;
  await page.keyboard.type('phthalo', { delay: 40 });
  await page.waitForSelector('[role=listbox]:not([hidden]) [role=option]');
  out.suggestions = await page.$$eval('[role=listbox]:not([hidden]) [role=option]', (os) => os.map((o) => o.textContent));
  await page.keyboard.press('ArrowDown');
  await page.keyboard.press('Enter');
  await page.waitForFunction((before) => {
    const s = document.querySelector('#status').textContent;
    return s.startsWith('Verdicts:') && s !== before;
  }, out.before);
  out.after = await page.textContent('#status');
  out.chips = await page.$$eval('.chip', (cs) => cs.map((c) => c.firstChild.textContent));
  await shot(page, 'page-edited.png');

  // An error beside its field, in the command line's words.
  const claimDate = 'input[data-path="claims.0.date"]';
  const oldDate = await page.inputValue(claimDate);
  await page.fill(claimDate, '18x7');
  await page.waitForSelector('#editor .error');
  out.error = await page.evaluate(() => {
    const e = document.querySelector('#editor .error');
    const field = document.querySelector('[aria-invalid=true]');
    return { text: e.textContent, field: field && field.getAttribute('data-path'), describedBy: field && field.getAttribute('aria-describedby') === e.id };
  });
  await shot(page, 'page-error.png');
  await page.fill(claimDate, oldDate);
  await page.waitForFunction(() => !document.querySelector('#editor .error') && document.querySelector('#status').textContent.startsWith('Verdicts:'));

  // A record's calendar, year start and note.
  await page.selectOption('select[data-path="records.0.calendar"]', 'julian');
  await page.selectOption('select[data-path="records.0.year_start"]', '25 March');
  await page.fill('input[data-path="records.0.note"]', 'the ledger counts its years from Lady Day');
  await page.waitForFunction(() => document.querySelector('#status').textContent.startsWith('Verdicts:'));
  const recordShot = join(outDir, 'page-record.png');
  await page.locator('div.card[data-path="records.0"]').screenshot({ path: recordShot });
  out.shots.push(recordShot);

  // Downloads.
  for (const [fmt, name] of [['yaml', 'case.yaml'], ['md', 'dating-section.md'], ['html', 'dating-report.html']]) {
    const [dl] = await Promise.all([page.waitForEvent('download'), page.click(`[data-export="${fmt}"]`)]);
    await dl.saveAs(join(outDir, name));
    out[fmt] = { suggested: dl.suggestedFilename(), path: join(outDir, name) };
  }

  // The page fits a laptop's width.
  out.overflow = {};
  for (const w of [1366, 1280]) {
    await page.setViewportSize({ width: w, height: 800 });
    out.overflow[w] = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  }

  // The materials browser.
  await page.click('#tab-materials');
  await page.fill('#mat-q', 'blue');
  await page.selectOption('#mat-class', 'pigment');
  await page.waitForFunction(() => /^\d+ material/.test(document.querySelector('#mat-count').textContent));
  out.materials = await page.textContent('#mat-count');
  await page.click('#mat-table tbody tr:first-child button');
  await page.waitForSelector('#mat-detail table');
  out.materialDetail = await page.textContent('#mat-detail h3');
  await shot(page, 'page-materials.png');
  out.failed = failed;
  out.outside = outside;
} finally {
  await b.close();
}
console.log(JSON.stringify(out));
