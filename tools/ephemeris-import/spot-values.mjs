#!/usr/bin/env node
// Prints the package's own evaluation of its series at a few epochs, so that the tests can check
// that our import and our evaluator reproduce them (tests/LunarShadow.Astronomy.Tests/Ephemeris).
//   node tools/ephemeris-import/spot-values.mjs DIR   (DIR: an unpacked astronomia@4.2.0)
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const dir = resolve(process.argv[2] ?? '.');
const src = (f) => import(pathToFileURL(join(dir, 'src', f)).href);
const dat = (f) => import(pathToFileURL(join(dir, 'data', f)).href);
const { Moon } = await src('elp.js');
const { Planet } = await src('planetposition.js');
const moonData = (await dat('elpMppDe.js')).default;
const moonFull = (await dat('elpMppDeFull.js')).default;
const earthData = (await dat('vsop87Bearth.js')).default;
const moon = new Moon(moonData), full = new Moon(moonFull), earth = new Planet(earthData);
for (const jde of [2448724.5, 2451545.0, 2460748.7902, 1625000.5, 2816000.5]) {
  const m = moon.positionXYZ(jde), f = full.positionXYZ(jde), e = earth.position2000(jde);
  console.log(JSON.stringify({ jde, moonXyzKm: [m.x, m.y, m.z], moonFullXyzKm: [f.x, f.y, f.z], earthLonRad: e.lon, earthLatRad: e.lat, earthRangeAu: e.range }));
}
