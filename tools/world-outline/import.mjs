#!/usr/bin/env node
// Writes the world land outline the page draws: Natural Earth's 1:110m land (public domain), as carried by the npm
// package world-atlas@2.0.2 (ISC), converted from TopoJSON with topojson-client@3.1.0, coordinates rounded to 0.1°.
//   node tools/world-outline/import.mjs
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

const repo = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const work = mkdtempSync(join(tmpdir(), 'lunarshadow-world-'));
execFileSync('npm', ['install', '--silent', '--no-audit', '--no-fund', '--prefix', work, 'world-atlas@2.0.2', 'topojson-client@3.1.0'], { stdio: 'inherit' });
const require = createRequire(join(work, 'package.json'));
const { feature } = require('topojson-client');
const topology = JSON.parse(readFileSync(join(work, 'node_modules', 'world-atlas', 'land-110m.json'), 'utf8'));
const land = feature(topology, topology.objects.land);
const round = (c) => Array.isArray(c[0]) ? c.map(round) : [Math.round(c[0] * 10) / 10, Math.round(c[1] * 10) / 10];
land.features.forEach((f) => { f.geometry.coordinates = round(f.geometry.coordinates); });
const text = JSON.stringify({ type: 'FeatureCollection', source: 'Natural Earth 1:110m land (public domain) via world-atlas@2.0.2', features: land.features });
const out = join(repo, 'src/LunarShadow.Api/wwwroot/data/land-110m.geojson');
execFileSync('mkdir', ['-p', dirname(out)]);
writeFileSync(out, text);
const sum = createHash('sha256').update(text).digest('hex');
writeFileSync(join(dirname(out), 'SHA256SUMS'), `${sum}  land-110m.geojson\n`);
console.log(`${sum}  ${out.slice(repo.length + 1)} (${text.length} bytes)`);
