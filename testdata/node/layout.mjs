// layout.mjs OUTDIR FILE... opens each file (an SVG picture or an HTML
// report) in chromium, measures every label of the timeline picture as
// drawn, and prints one JSON line per file: the labels that overlap
// another, the marks and labels that lie outside the drawing, and the
// screenshot it saved in OUTDIR.
import { launch } from './browser.mjs';
import { basename, join } from 'node:path';
import { pathToFileURL } from 'node:url';

const [outDir, ...files] = process.argv.slice(2);
const b = await launch();
try {
  const page = b.context.pages()[0] || await b.context.newPage();
  await page.setViewportSize({ width: 820, height: 700 });
  for (const file of files) {
    await page.goto(pathToFileURL(file).href);
    const m = await page.evaluate(() => {
      const svg = document.querySelector('svg.terminus-timeline') || document.querySelector('svg');
      const box = svg.getBoundingClientRect();
      const scale = box.width / svg.viewBox.baseVal.width;
      const rect = (el) => {
        const r = el.getBoundingClientRect();
        return { x0: (r.left - box.left) / scale, y0: (r.top - box.top) / scale, x1: (r.right - box.left) / scale, y1: (r.bottom - box.top) / scale };
      };
      const labels = [...svg.querySelectorAll('text.label')].map((el) => ({ text: el.textContent, ...rect(el) }));
      const overlaps = [];
      for (let i = 0; i < labels.length; i++) {
        for (let j = i + 1; j < labels.length; j++) {
          const a = labels[i], c = labels[j];
          const w = Math.min(a.x1, c.x1) - Math.max(a.x0, c.x0);
          const h = Math.min(a.y1, c.y1) - Math.max(a.y0, c.y0);
          if (w > 0.5 && h > 0.5) overlaps.push([a.text, c.text]);
        }
      }
      const W = svg.viewBox.baseVal.width, H = svg.viewBox.baseVal.height;
      const outside = [];
      for (const el of svg.querySelectorAll('text, rect, path, line')) {
        if (el.closest('defs')) continue;
        const r = rect(el);
        if (r.x0 < -0.5 || r.y0 < -0.5 || r.x1 > W + 0.5 || r.y1 > H + 0.5) {
          outside.push(`${el.tagName} ${el.textContent.slice(0, 40)} at ${r.x0.toFixed(1)},${r.y0.toFixed(1)}–${r.x1.toFixed(1)},${r.y1.toFixed(1)}`);
        }
      }
      return { labels: labels.length, overlaps, outside, width: W, height: H };
    });
    const shot = join(outDir, basename(file).replace(/\.[a-z]+$/, '') + '.png');
    const svg = await page.$('svg.terminus-timeline');
    await (svg || page).screenshot({ path: shot });
    console.log(JSON.stringify({ file, shot, ...m }));
  }
} finally {
  await b.close();
}
