// Reference timing for the cold-catalogue benchmark (ColdCatalogueTiming.cs): every lunar eclipse with its peak in a
// span of years, found by the general-purpose library astronomy-engine (npm, MIT; installed by the benchmark into a
// temporary folder, never committed). Usage: node astronomy-engine-search.mjs PACKAGE_DIR FIRST_YEAR LAST_YEAR
// Prints one JSON line: the count and the search time in milliseconds (the module already loaded, as our server is).
import { createRequire } from 'node:module';
import { join } from 'node:path';

const [packageDir, firstYear, lastYear] = process.argv.slice(2);
const Astronomy = createRequire(join(packageDir, 'package.json'))('astronomy-engine');
const start = Astronomy.MakeTime((() => {
  const d = new Date(Date.UTC(2000, 0, 1));
  d.setUTCFullYear(Number(firstYear));
  return d;
})());
const end = (() => {
  const d = new Date(Date.UTC(2000, 0, 1));
  d.setUTCFullYear(Number(lastYear) + 1);
  return d.getTime();
})();

const t0 = process.hrtime.bigint();
let count = 0;
for (let e = Astronomy.SearchLunarEclipse(start); e.peak.date.getTime() < end; e = Astronomy.NextLunarEclipse(e.peak)) count++;
const ms = Number(process.hrtime.bigint() - t0) / 1e6;
console.log(JSON.stringify({ count, ms }));
