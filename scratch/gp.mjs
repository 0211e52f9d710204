import { createParser } from '@tracespace/parser';
import { readFileSync } from 'node:fs';
const p = createParser();
p.feed(readFileSync('/tmp/glass-out/brookfern-garden-water-timer-demo-common.gbr', 'utf8'));
const tree = p.results();
const types = {};
for (const c of tree.children) types[c.type] = (types[c.type] || 0) + 1;
console.log(Object.keys(tree), types, JSON.stringify(tree.children.slice(0, 12)).slice(0, 1500));
