// The night at the site: sky darkness, the Moon's altitude (dashed where it is below the horizon), the phases and the
// opening hours as bars, contact labels stacked so they never overlap, and a local-time axis.
import { el, reset, widthOf, textWidth, stackInRows, spreadInRow } from './svg.js';
import { drawTimeAxis } from './axis.js';
import { offsetLookup } from './time.js';

// Colours of the sky states; the service classifies each sample (the track point's `sky`), so the page holds no
// copy of the twilight thresholds.
export const SKY = {
  day: '#5a6fa8', 'civil-twilight': '#3a4a80', 'nautical-twilight': '#26315e', 'astronomical-twilight': '#182044', night: '#0b1026',
};
export const skyColour = (state) => SKY[state] ?? SKY.night;
// Okabe & Ito (2008) colour-universal palette: sky blue, orange, vermillion; the opening hours in its yellow.
export const PHASE = { penumbral: '#56B4E9', partial: '#E69F00', total: '#D55E00' };
export const OPEN = '#F0E442';
export const contactLabel = (name) => name;

const ms = (iso) => Date.parse(iso);

/** The instants a night chart should span: the eclipse and the opening hours, an hour either side, within the track. */
export function nightSpan(local, eclipse) {
  const track = local.track;
  const first = ms(track[0].utc), last = ms(track[track.length - 1].utc);
  const contacts = eclipse.contacts.map((c) => ms(c.utc));
  const open = local.publicNight ? [ms(local.publicNight.opens), ms(local.publicNight.closes)] : [];
  const all = [...contacts, ...open];
  const t0 = Math.max(first, Math.min(...all) - 3600000);
  const t1 = Math.min(last, Math.max(...all) + 3600000);
  return [t0, t1];
}

export function drawTimeline(svg, local, eclipse) {
  const W = widthOf(svg);
  const [t0, t1] = nightSpan(local, eclipse);
  const track = local.track.filter((p) => ms(p.utc) >= t0 && ms(p.utc) <= t1);
  const left = 46, right = 12;
  const x = (t) => left + (t - t0) / (t1 - t0) * (W - left - right);
  const scale = { x, t0, t1, width: W };
  // Contact labels: stacked into rows above the chart, each tied to its instant by a leader line.
  const contacts = local.contacts.map((c) => ({ ...c, label: contactLabel(c.name) }));
  const items = contacts.map((c) => ({ x: x(ms(c.utc)), width: textWidth(c.label) }));
  // One row, spread apart with fanned leader lines; several rows only if the labels cannot fit side by side.
  const spread = spreadInRow(items, 2, W - 2);
  const { placed, rows } = spread ? { placed: spread.map((px) => ({ x: px, row: 0 })), rows: 1 } : stackInRows(items, 2, W - 2);
  const rowHeight = 17;
  const labelTop = 6;
  const barsTop = labelTop + rows * rowHeight + 14;
  const bar = 8;
  const barRows = ['penumbral', 'partial', 'total', 'open'];
  const top = barsTop + barRows.length * (bar + 3) + 4;
  const plotHeight = W < 560 ? 170 : 210;
  const bottom = top + plotHeight;
  const H = bottom + 64;
  reset(svg, 'The Moon\'s altitude through the night, in local time', W, H);

  const altitudes = track.map((p) => Math.min(p.moonAltitudeDegrees, p.horizonAltitudeDegrees));
  const lo = Math.min(-10, Math.floor(Math.min(...altitudes) / 10) * 10);
  const y = (alt) => top + (90 - alt) / (90 - lo) * plotHeight;

  // Sky state behind the plot.
  for (let i = 0; i < track.length; i++) {
    const a = Math.max(t0, i === 0 ? t0 : (ms(track[i - 1].utc) + ms(track[i].utc)) / 2);
    const b = Math.min(t1, i === track.length - 1 ? t1 : (ms(track[i].utc) + ms(track[i + 1].utc)) / 2);
    if (b <= a) continue;
    svg.appendChild(el('rect', { x: x(a), y: top, width: x(b) - x(a) + 0.6, height: plotHeight, fill: skyColour(track[i].sky), class: 'sky' }));
  }
  // Below the horizon: the ground, shaded and hatched, so the Moon's path there is shown, not hidden.
  const ground = track.map((p) => `${x(Math.min(Math.max(ms(p.utc), t0), t1))},${y(p.horizonAltitudeDegrees)}`);
  svg.appendChild(el('polygon', { points: [`${x(t0)},${y(lo)}`, ...ground, `${x(t1)},${y(lo)}`].join(' '), fill: 'url(#ground-hatch)', class: 'below-horizon' }));
  const defs = el('defs');
  const hatch = el('pattern', { id: 'ground-hatch', width: 6, height: 6, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' });
  hatch.appendChild(el('rect', { width: 6, height: 6, fill: '#1a1d24' }));
  hatch.appendChild(el('line', { x1: 0, y1: 0, x2: 0, y2: 6, stroke: '#3a3f4c', 'stroke-width': 2 }));
  defs.appendChild(hatch);
  svg.insertBefore(defs, svg.firstChild.nextSibling);

  // Opening hours as a light band over the plot.
  const night = local.publicNight;
  if (night) {
    const a = Math.max(t0, ms(night.opens)), b = Math.min(t1, ms(night.closes));
    if (b > a) svg.appendChild(el('rect', { x: x(a), y: top, width: x(b) - x(a), height: plotHeight, fill: OPEN, opacity: 0.1, class: 'open-band' }));
  }

  // Altitude grid and labels.
  let lowest = 90;
  for (let alt = 90; alt >= lo; alt -= 30) {
    const yy = y(alt);
    svg.appendChild(el('line', { x1: left, x2: W - right, y1: yy, y2: yy, class: alt === 0 ? 'horizon-line' : 'grid-line' }));
    svg.appendChild(el('text', { x: left - 6, y: yy + 4, 'text-anchor': 'end', class: 'chart-label altitude-label' }, `${alt}°`));
    lowest = alt;
  }
  if (lo < lowest && y(lo) - y(lowest) >= 24) {
    svg.appendChild(el('text', { x: left - 6, y: y(lo) - 1, 'text-anchor': 'end', class: 'chart-label altitude-label' }, `${lo}°`));
  }

  // The local horizon profile, and the Moon: solid while it is above it, dashed below.
  if (track.some((p) => p.horizonAltitudeDegrees !== 0)) {
    svg.appendChild(el('polyline', { points: ground.join(' '), fill: 'none', class: 'horizon-profile' }));
  }
  let run = [];
  let runUp = null;
  const flush = () => {
    if (run.length > 1) svg.appendChild(el('polyline', { points: run.join(' '), fill: 'none', class: runUp ? 'moon-altitude' : 'moon-below' }));
  };
  for (const p of track) {
    const up = p.moonAltitudeDegrees >= p.horizonAltitudeDegrees;
    const pt = `${x(Math.min(Math.max(ms(p.utc), t0), t1))},${y(p.moonAltitudeDegrees)}`;
    if (runUp !== null && up !== runUp) { run.push(pt); flush(); run = [pt]; } else run.push(pt);
    runUp = up;
  }
  flush();

  // Phase bars: the whole phase faint, the part visible from the site solid; the opening hours below them.
  const c = Object.fromEntries(eclipse.contacts.map((k) => [k.name, k.utc]));
  const spans = { penumbral: ['P1', 'P4'], partial: ['U1', 'U4'], total: ['U2', 'U3'] };
  barRows.forEach((phase, i) => {
    const yy = barsTop + i * (bar + 3);
    if (phase === 'open') {
      if (night) svg.appendChild(el('rect', { x: x(Math.max(t0, ms(night.opens))), y: yy, width: Math.max(1, x(Math.min(t1, ms(night.closes))) - x(Math.max(t0, ms(night.opens)))), height: bar, fill: OPEN, class: 'open-bar' }));
      return;
    }
    const [a, b] = spans[phase];
    if (!c[a] || !c[b]) return;
    svg.appendChild(el('rect', { x: x(ms(c[a])), y: yy, width: Math.max(1, x(ms(c[b])) - x(ms(c[a]))), height: bar, fill: PHASE[phase], opacity: 0.35, class: `phase-${phase}` }));
    for (const v of local.visiblePhases.filter((p) => p.phase === phase)) {
      svg.appendChild(el('rect', { x: x(ms(v.startUtc)), y: yy, width: Math.max(3, x(ms(v.endUtc)) - x(ms(v.startUtc))), height: bar, fill: PHASE[phase], class: `visible-${phase}` }));
    }
  });

  // Contact marks and their labels.
  contacts.forEach((k, i) => {
    const px = x(ms(k.utc));
    const ly = labelTop + placed[i].row * rowHeight + 12;
    svg.appendChild(el('line', { x1: px, x2: px, y1: barsTop - 2, y2: bottom, class: 'contact-mark' }));
    const ry = labelTop + (rows - 1) * rowHeight + 12;
    svg.appendChild(el('polyline', { points: `${placed[i].x},${ly + 4} ${placed[i].x},${ry + 4} ${px},${barsTop - 3}`, fill: 'none', class: 'leader' }));
    svg.appendChild(el('text', { x: placed[i].x, y: ly, 'text-anchor': 'middle', class: `chart-label contact-label${k.visible ? '' : ' not-visible'}` }, k.label));
  });

  const offsets = offsetLookup(local.track.map((p) => p.local));
  drawTimeAxis(svg, scale, offsets, local.site.timeZone, top, bottom, local.site.zoneAbbreviation ?? local.zoneAbbreviation ?? local.contacts[0]?.zoneAbbreviation);
}
