#!/usr/bin/env node
// Imports the published coefficient tables of ELP/MPP02 (Chapront & Francou 2003, DE405 fit)
// and VSOP87B Earth (Bretagnon & Francou 1988), and the USNO/IERS series of measured ΔT,
// from the MIT-licensed npm package astronomia@4.2.0 into the compact binary block files
// that LunarShadow.Astronomy embeds, then writes their SHA-256 sums.
//
//   node tools/ephemeris-import/import.mjs            (fetches the package with `npm pack`)
//   node tools/ephemeris-import/import.mjs DIR        (uses an unpacked package in DIR)
//
// Block file layout (little-endian): magic "LSBLOCK1", int32 block count, then per block:
// uint8 name length, ASCII name, int32 rows, int32 columns, rows*columns float64 values.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const PACKAGE = 'astronomia@4.2.0';
const here = dirname(fileURLToPath(import.meta.url));
const repo = resolve(here, '..', '..');
const ephemerisOut = join(repo, 'src/LunarShadow.Astronomy/Ephemeris/Data');
const timeOut = join(repo, 'src/LunarShadow.Astronomy/Time/Data');

function unpackPackage() {
  if (process.argv[2]) return resolve(process.argv[2]);
  const work = mkdtempSync(join(tmpdir(), 'lunarshadow-import-'));
  execFileSync('npm', ['pack', PACKAGE, '--silent'], { cwd: work, stdio: ['ignore', 'pipe', 'inherit'] });
  execFileSync('tar', ['xzf', 'astronomia-4.2.0.tgz'], { cwd: work });
  return join(work, 'package');
}

async function load(dir, file) {
  // The data files are ES modules with a default export; copy to .mjs so node loads them as such.
  const source = readFileSync(join(dir, 'data', file), 'utf8');
  const tmp = join(mkdtempSync(join(tmpdir(), 'lunarshadow-mod-')), file.replace(/\.js$/, '.mjs'));
  writeFileSync(tmp, source);
  return (await import(pathToFileURL(tmp).href)).default;
}

function encode(blocks) {
  const parts = [Buffer.from('LSBLOCK1', 'ascii')];
  const count = Buffer.alloc(4); count.writeInt32LE(blocks.length); parts.push(count);
  for (const { name, rows } of blocks) {
    const columns = rows.length ? rows[0].length : 0;
    const head = Buffer.alloc(1 + name.length + 8);
    head.writeUInt8(name.length, 0); head.write(name, 1, 'ascii');
    head.writeInt32LE(rows.length, 1 + name.length); head.writeInt32LE(columns, 5 + name.length);
    parts.push(head);
    const body = Buffer.alloc(8 * rows.length * columns);
    rows.forEach((row, i) => {
      if (row.length !== columns) throw new Error(`${name}: ragged row ${i}`);
      row.forEach((v, j) => body.writeDoubleLE(v, 8 * (i * columns + j)));
    });
    parts.push(body);
  }
  return Buffer.concat(parts);
}

// Each coordinate (L, B, R) holds series keyed by the power of time they multiply.
function seriesBlocks(model) {
  const blocks = [];
  for (const coordinate of ['L', 'B', 'R']) {
    for (const power of Object.keys(model[coordinate]).sort()) {
      blocks.push({ name: `${coordinate}${power}`, rows: model[coordinate][power] });
    }
  }
  return blocks;
}

function dayNumberOfMonthStart(year, month) {
  // Modified Julian Date of the first of a Gregorian month (Meeus 1998, ch. 7).
  const y = month <= 2 ? year - 1 : year, m = month <= 2 ? month + 12 : month;
  const a = Math.floor(y / 100), b = 2 - a + Math.floor(a / 4);
  return Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * (m + 1)) + 1 + b - 1524.5 - 2400000.5;
}

const dir = unpackPackage();
const files = {};
const elp = await load(dir, 'elpMppDe.js');
files[join(ephemerisOut, 'elpmpp02-de405-truncated.bin')] = encode([{ name: 'W1', rows: [elp.W1] }, ...seriesBlocks(elp)]);
const elpFull = await load(dir, 'elpMppDeFull.js');
files[join(ephemerisOut, 'elpmpp02-de405-full.bin')] = encode([{ name: 'W1', rows: [elpFull.W1] }, ...seriesBlocks(elpFull)]);
const vsop = await load(dir, 'vsop87Bearth.js');
files[join(ephemerisOut, 'vsop87b-earth.bin')] = encode(seriesBlocks(vsop));

// Measured ΔT, monthly, from data/deltat.txt (year, month, ΔT seconds at the first of the month).
const monthly = readFileSync(join(dir, 'data', 'deltat.txt'), 'utf8').trim().split('\n')
  .map((line) => line.trim().split(/\s+/).map(Number))
  .map(([year, month, seconds]) => [dayNumberOfMonthStart(year, month), seconds]);
// The USNO historic series (half-yearly decimal years from 1657) from data/deltat.js.
const deltat = await load(dir, 'deltat.js');
const historic = deltat.historic.table.map((seconds, i) => [deltat.historic.first + 0.5 * i, seconds]);
files[join(timeOut, 'deltat-measured.bin')] = encode([{ name: 'MONTHLY_MJD', rows: monthly }, { name: 'HALFYEAR_YEAR', rows: historic }]);

const sums = {};
for (const [path, bytes] of Object.entries(files)) {
  if (!existsSync(dirname(path))) execFileSync('mkdir', ['-p', dirname(path)]);
  writeFileSync(path, bytes);
  sums[path] = createHash('sha256').update(bytes).digest('hex');
}
for (const folder of [ephemerisOut, timeOut]) {
  const lines = Object.entries(sums).filter(([p]) => dirname(p) === folder)
    .map(([p, h]) => `${h}  ${p.slice(folder.length + 1)}`).sort();
  writeFileSync(join(folder, 'SHA256SUMS'), lines.join('\n') + '\n');
}
for (const [path, hash] of Object.entries(sums)) console.log(`${hash}  ${path.slice(repo.length + 1)}  (${files[path].length} bytes)`);
