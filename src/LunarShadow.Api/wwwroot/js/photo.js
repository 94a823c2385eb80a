// The photographer's view: a camera set-up, the exposure timeline drawn (shutter against local time, with the bracket
// and the phases), the framing, the warnings, and downloads, all from the /photo-plan API.
import { getJson, photoUrl, ApiError } from './api.js';
import { el, reset, widthOf, textWidth, box, intersects } from './svg.js';
import { drawTimeAxis } from './axis.js';
import { offsetLookup, wallClock } from './time.js';
import { PHASE } from './timeline.js';

const $ = (id) => document.getElementById(id);
let current = null;
let lastPlan = null;
let danjonName = 'danjon';

function camera() {
  return {
    sensor: $('sensor').value, pixels: $('pixels').value.trim(), focalLength: $('focal').value.trim(),
    aperture: $('aperture').value.trim(), iso: $('iso').value.trim(), mount: $('mount').value,
  };
}

/** The photo plan; the Danjon parameter is sent as `danjon`, or as `danjonL` once the service refuses the old name. */
async function fetchPlan(date, site, extra = {}) {
  const cam = camera();
  const danjon = $('danjon').value.trim();
  try {
    return await getJson(photoUrl(date, site, { ...cam, [danjonName]: danjon }, extra));
  } catch (error) {
    const value = Number(danjon);
    if (danjonName === 'danjon' && error instanceof ApiError && error.status === 400 && error.fields?.danjon && value >= 0 && value <= 4) {
      danjonName = 'danjonL';
      return getJson(photoUrl(date, site, { ...cam, danjonL: danjon }, extra));
    }
    throw error;
  }
}

/** Shows the camera set-up for a new eclipse or site; the plan is drawn when the photographer asks for it. */
export function showPhotoSection(date, site) {
  const same = current && current.date === date && JSON.stringify(current.site) === JSON.stringify(site);
  current = { date, site };
  $('photo').hidden = false;
  if (!same) {
    $('photo-result').hidden = true;
    $('photo-error').hidden = true;
  } else if (lastPlan) {
    plan();
  }
}

async function plan(event) {
  event?.preventDefault();
  if (!current) return;
  const { date, site } = current;
  $('photo-error').hidden = true;
  try {
    const p = await fetchPlan(date, site);
    lastPlan = p;
    $('photo-result').hidden = false;
    drawExposure($('exposure-chart'), p);
    framing(p);
    warnings(p);
    downloads(date, site);
  } catch (error) {
    $('photo-result').hidden = true;
    $('photo-error').hidden = false;
    $('photo-error').textContent = `No photo plan: ${error.message}`;
  }
}

const log2 = Math.log2;
function shutterText(s) {
  if (s >= 1) return `${Number(s.toPrecision(2))} s`;
  return `1/${Math.round(1 / s)} s`;
}

export function drawExposure(svg, p) {
  const W = widthOf(svg);
  const rows = p.timeline;
  if (rows.length < 2) { reset(svg, 'No visible eclipse to expose for', W, 40); return; }
  const left = 62, right = 12, top = 10, plotHeight = W < 560 ? 170 : 210;
  const bottom = top + plotHeight;
  reset(svg, 'Suggested shutter time through the eclipse', W, bottom + 64);
  const t0 = Date.parse(rows[0].utc), t1 = Date.parse(rows[rows.length - 1].utc);
  const x = (t) => left + (t - t0) / (t1 - t0 || 1) * (W - left - right);
  const shutters = rows.flatMap((r) => [r.exposure.shutterSeconds, ...r.exposure.bracketShutterSeconds]).filter((s) => s > 0 && Number.isFinite(s));
  const lo = Math.floor(log2(Math.min(...shutters))), hi = Math.ceil(log2(Math.max(...shutters)));
  const y = (s) => bottom - (log2(s) - lo) / Math.max(1, hi - lo) * plotHeight;
  // Phase bands behind.
  for (let i = 0; i < rows.length - 1; i++) {
    const phase = rows[i].phase;
    if (!PHASE[phase]) continue;
    svg.appendChild(el('rect', { x: x(Date.parse(rows[i].utc)), y: top, width: Math.max(0.5, x(Date.parse(rows[i + 1].utc)) - x(Date.parse(rows[i].utc))), height: plotHeight, fill: PHASE[phase], opacity: 0.22, class: `band-${phase}` }));
  }
  // Shutter grid in whole stops, labelled where there is room.
  const labelled = [];
  for (let e = lo; e <= hi; e++) {
    const yy = y(2 ** e);
    svg.appendChild(el('line', { x1: left, x2: W - right, y1: yy, y2: yy, class: 'grid-line' }));
    const text = shutterText(2 ** e);
    const b = box(left - 6, yy + 4, textWidth(text), 'end');
    if (labelled.some((o) => intersects(o, b))) continue;
    labelled.push(b);
    svg.appendChild(el('text', { x: left - 6, y: yy + 4, 'text-anchor': 'end', class: 'chart-label shutter-label' }, text));
  }
  const pts = (pick) => rows.map((r) => `${x(Date.parse(r.utc))},${y(pick(r))}`);
  const darkest = (r) => Math.min(...r.exposure.bracketShutterSeconds);
  const brightest = (r) => Math.max(...r.exposure.bracketShutterSeconds);
  svg.appendChild(el('polygon', { points: [...pts(darkest), ...pts(brightest).reverse()].join(' '), class: 'bracket-band' }));
  if (p.framing.trailingLimitSeconds) {
    const yy = y(p.framing.trailingLimitSeconds);
    if (yy >= top && yy <= bottom) svg.appendChild(el('line', { x1: left, x2: W - right, y1: yy, y2: yy, class: 'trailing-limit' }));
  }
  svg.appendChild(el('polyline', { points: pts((r) => r.exposure.shutterSeconds).join(' '), fill: 'none', class: 'exposure-line' }));
  const offsets = offsetLookup(rows.map((r) => r.local));
  drawTimeAxis(svg, { x, t0, t1, width: W }, offsets, p.site.timeZone, top, bottom, p.site.zoneAbbreviation);
}

function framing(p) {
  const f = p.framing;
  const facts = [
    ['Field of view', `${f.fieldOfViewWidthDegrees.toFixed(2)}° × ${f.fieldOfViewHeightDegrees.toFixed(2)}°`],
    ['The Moon on the sensor', `${Math.round(f.moonDiameterPixels)} px across, ${(f.moonFractionOfFrameHeight * 100).toFixed(0)} % of the frame's height`],
    ['Drift', `the Moon leaves a fixed frame about ${Math.round(f.minutesInFixedFrame)} min after you aim at it`],
    ['Longest sharp shutter', f.trailingLimitSeconds == null ? 'no limit: the mount follows the Moon' : `${shutterText(f.trailingLimitSeconds)} on this mount (tripod ${shutterText(f.fixedTripodLimitSeconds)}, star tracker ${shutterText(f.siderealLimitSeconds)})`],
    ['Camera', `${p.camera.focalLengthMm} mm f/${p.camera.aperture}, ${p.camera.iso ? 'ISO ' + p.camera.iso : 'shutter fixed'}, ${p.camera.mount} mount; Danjon L ${p.model.danjonL ?? p.model.danjon}`],
  ];
  if (p.sequences) {
    const c = p.sequences.composite, tl = p.sequences.timeLapse;
    facts.push(['Multi-exposure', `${c.exposures} frames every ${Math.round(c.intervalSeconds / 60)} min; ${c.fitsLandscape ? 'fits landscape' : c.fitsPortrait ? 'fits portrait' : 'does not fit the frame'}; aim at azimuth ${c.aimAzimuthDegrees.toFixed(0)}°, altitude ${c.aimAltitudeDegrees.toFixed(0)}°`]);
    facts.push(['Time-lapse', `${tl.frames} frames every ${tl.intervalSeconds} s (${tl.storageGigabytes} GB, ${tl.playbackSecondsAt25Fps} s at 25 fps)`]);
  }
  const dl = $('framing');
  dl.innerHTML = '';
  for (const [k, v] of facts) {
    dl.appendChild(Object.assign(document.createElement('dt'), { textContent: k }));
    dl.appendChild(Object.assign(document.createElement('dd'), { textContent: v }));
  }
}

// A warning that differs only in its numbers from frame to frame ("ISO changed from 400 to 431…") is one warning;
// each number that varies is shown as its range.
const NUMBER = /\d+(?:\.\d+)?/g;

function warnings(p) {
  // Each distinct warning once, with the local times it applies to.
  const seen = new Map();
  for (const r of p.timeline) {
    for (const w of r.warnings) {
      const kind = w.includes(':') ? w.split(':')[0] : w.replace(NUMBER, '#');
      if (!seen.has(kind)) seen.set(kind, { text: w, times: [], numbers: [] });
      const entry = seen.get(kind);
      entry.times.push(wallClock(r.local).hm);
      if (!w.includes(':')) entry.numbers.push((w.match(NUMBER) ?? []).map(Number));
    }
  }
  const ul = $('photo-warnings');
  ul.innerHTML = '';
  for (const { text, times, numbers } of seen.values()) {
    const span = times.length > 1 ? `${times[0]}–${times[times.length - 1]}` : times[0];
    let slot = 0;
    const merged = numbers.length > 1 ? text.replace(NUMBER, () => {
      const values = numbers.map((n) => n[slot]);
      slot++;
      const [lo, hi] = [Math.min(...values), Math.max(...values)];
      return lo === hi ? String(lo) : `${lo}–${hi}`;
    }) : text;
    ul.appendChild(Object.assign(document.createElement('li'), { textContent: `${span}: ${merged}` }));
  }
  // Notes for a run of rows (an ISO change) come once each, already naming their time range.
  for (const n of p.notes ?? []) ul.appendChild(Object.assign(document.createElement('li'), { textContent: n.text }));
  for (const c of p.cautions) ul.appendChild(Object.assign(document.createElement('li'), { textContent: c }));
  if (!ul.children.length) ul.appendChild(Object.assign(document.createElement('li'), { textContent: 'No warnings for this set-up.' }));
}

function downloads(date, site) {
  const ul = $('photo-downloads');
  ul.innerHTML = '';
  const cam = { ...camera(), [danjonName]: $('danjon').value.trim() };
  for (const [label, format, ext] of [['Exposure sequence (for camera-control scripts)', 'sequence', 'txt'], ['Exposure timeline as CSV', 'csv', 'csv'], ['Shooting plan for the calendar', 'ics', 'ics']]) {
    const a = Object.assign(document.createElement('a'), { textContent: label, href: photoUrl(date, site, cam, { format }) });
    a.download = `eclipse-${date}-photo.${ext}`;
    ul.appendChild(document.createElement('li')).appendChild(a);
  }
}

$('camera').addEventListener('submit', plan);
let timer;
window.addEventListener('resize', () => { clearTimeout(timer); timer = setTimeout(() => lastPlan && !$('photo-result').hidden && drawExposure($('exposure-chart'), lastPlan), 150); });
