// One chart through the jsdom route from a cold process, for the cold-start comparison.
import { readFileSync } from 'node:fs';
import { csvParse } from 'd3-dsv';
import { jsdomRoute } from './routes.js';

const rows = csvParse(readFileSync(new URL('../demo-data/hut-overnights.csv', import.meta.url), 'utf8')).map((r) => ({ label: r.hut, value: Number(r.overnights) }));
const route = await jsdomRoute();
process.stdout.write(route.newDocument(rows).slice(0, 0));
