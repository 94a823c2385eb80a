#!/usr/bin/env node
// Prints moonrise and moonset from the general-purpose npm library astronomy-engine@2.1.19 (MIT), as an outside check
// for tests/LunarShadow.Astronomy.Tests/Sites/MoonRiseSetTests.cs. Run from any folder:
//   node tools/reference-values/moon-rise-set.mjs
import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';

const work = mkdtempSync(join(tmpdir(), 'lunarshadow-ref-'));
execFileSync('npm', ['install', '--silent', '--no-audit', '--no-fund', '--prefix', work, 'astronomy-engine@2.1.19'], { stdio: 'inherit' });
const Astronomy = createRequire(join(work, 'package.json'))('astronomy-engine');

// latitude, longitude, start (UTC), as used by the tests
const cases = [
  [51.5, -0.12, '2025-03-14T00:00:00Z'],
  [-33.87, 151.2, '2025-03-14T00:00:00Z'],
  [40.71, -74.0, '2025-03-13T12:00:00Z'],
  [69.65, 18.96, '2025-03-14T00:00:00Z'],
  [0.0, 0.0, '2022-11-08T00:00:00Z'],
  [-45.0, 170.0, '2022-11-08T00:00:00Z'],
];
for (const [lat, lon, start] of cases) {
  const observer = new Astronomy.Observer(lat, lon, 0);
  const t0 = Astronomy.MakeTime(new Date(start));
  const rise = Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, +1, t0, 2);
  const set = Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, -1, t0, 2);
  console.log(JSON.stringify({ lat, lon, start, rise: rise?.date.toISOString(), set: set?.date.toISOString() }));
}

// Almanac convention (metersAboveGround 0) and sea horizon (metersAboveGround = height) for elevated sites.
for (const [lat, lon, height, start] of [[47.3, 8.2, 550, '2029-12-20T00:00:00Z'], [46.55, 7.98, 3000, '2025-03-14T00:00:00Z'], [-33.87, 151.2, 100, '2025-03-14T00:00:00Z']]) {
  const observer = new Astronomy.Observer(lat, lon, height);
  const t0 = Astronomy.MakeTime(new Date(start));
  for (const ground of [0, height]) {
    const rise = Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, +1, t0, 1.5, ground);
    const set = Astronomy.SearchRiseSet(Astronomy.Body.Moon, observer, -1, t0, 1.5, ground);
    console.log(JSON.stringify({ lat, lon, height, metersAboveGround: ground, rise: rise?.date.toISOString(), set: set?.date.toISOString() }));
  }
}
