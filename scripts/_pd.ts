import { readFileSync, writeFileSync } from 'node:fs';
import { parseDesignText } from '/work/main/src/lib/core/design/parse-design';
import { planGlass } from '/work/main/src/lib/core/glass/plan-glass';
import { checkGlass } from '/work/main/src/lib/core/glass/check-glass';
import { glassExportFiles } from '/work/main/src/lib/core/export/glass-export';
import { Resvg } from '@resvg/resvg-js';
const text = readFileSync(process.argv[2] ?? '/work/main/src/lib/core/design/demo-design.json', 'utf8');
const r: any = parseDesignText(text);
const design = r.design;
const t0 = performance.now();
const plan = planGlass(design);
const t1 = performance.now();
const planned = { ...design, glassArt: plan.glassArt };
const checked = checkGlass(planned);
console.log('plan ms', (t1 - t0).toFixed(0), 'check ms', (performance.now() - t1).toFixed(0));
const bad = [...plan.findings, ...checked.findings].filter((f) => f.severity !== 'pass');
const counts: Record<string, number> = {};
for (const f of bad) counts[f.code] = (counts[f.code] ?? 0) + 1;
console.log(JSON.stringify(counts));
for (const f of bad) if (f.code !== 'glass.open') console.log(f.code, f.severity, f.electrodes.join(','), '|', f.message.slice(0, 160));
for (const f of glassExportFiles(planned, ['svg'])) {
  if (!f.name.endsWith('composite.svg') && !f.name.endsWith('common.svg') && !f.name.endsWith('segment.svg')) continue;
  const png = new Resvg(f.content as string, { fitTo: { mode: 'width', value: 2000 }, background: 'white' }).render().asPng();
  const kind = f.name.split('-').at(-1)!.replace('.svg', '');
  writeFileSync(`/tmp/demo-${kind}.png`, png);
}
