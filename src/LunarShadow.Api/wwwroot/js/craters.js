// Crater timings for the chosen eclipse: a table of when the umbra's edge reaches and leaves named features, and a
// small disc chart of where they lie. Self-contained: it listens to the plan form and fills <section id="craters">.
import { getJson } from './api.js';
import { el, reset, widthOf, textWidth, placeFree } from './svg.js';

const $ = (id) => document.getElementById(id);

function cratersUrl(date, site) {
  const q = new URLSearchParams();
  for (const key of ['lat', 'lon', 'tz']) if (site[key]) q.set(key, site[key]);
  const query = q.toString();
  return `/api/v1/eclipses/${encodeURIComponent(date)}/craters${query ? '?' + query : ''}`;
}

function element(name, attributes = {}, text) {
  const e = name.startsWith('svg:') ? document.createElementNS('http://www.w3.org/2000/svg', name.slice(4)) : document.createElement(name);
  for (const [k, v] of Object.entries(attributes)) e.setAttribute(k, v);
  if (text !== undefined) e.textContent = text;
  return e;
}

const clock = (crossing) => crossing ? (crossing.local ?? crossing.utc).slice(11, 19) : '—';

/** Well-known features labelled by name on the charts (the rest are dots with a tooltip); the table lists them all. */
export const HEADLINE_FEATURES = ['Tycho', 'Plato', 'Aristarchus', 'Langrenus', 'Copernicus', 'Grimaldi', 'Proclus', 'Kepler', 'Menelaus', 'Petavius'];

// The disc as a lunar map shows it (selenographic north up, east to the right, no libration): orthographic projection.
// Drawn at its on-screen width like the other charts; names placed clear of each other with svg.js.
function drawDisc(svg, features) {
  const W = Math.min(widthOf(svg, 320), 420);
  const H = W;
  reset(svg, 'Lunar features timed at this eclipse', W, H);
  const c = W / 2, R = W / 2 - 46;
  svg.appendChild(el('circle', { cx: c, cy: c, r: R, class: 'crater-disc' }));
  const shown = [];
  for (const f of features) {
    const lat = f.latitudeDegrees * Math.PI / 180;
    const lon = f.longitudeDegrees * Math.PI / 180;
    if (Math.cos(lat) * Math.cos(lon) < 0) continue;
    const x = c + R * Math.cos(lat) * Math.sin(lon);
    const y = c - R * Math.sin(lat);
    const dot = el('circle', { cx: x.toFixed(1), cy: y.toFixed(1), r: 3.5, class: f.reachedByUmbra ? 'crater-reached' : 'crater-missed' });
    dot.appendChild(el('title', {}, f.reachedByUmbra ? `${f.name}: umbra ${clock(f.immersion)}–${clock(f.emersion)}` : `${f.name}: not reached by the umbra`));
    svg.appendChild(dot);
    if (HEADLINE_FEATURES.includes(f.name)) shown.push({ f, x, y });
  }
  // Every dot is an obstacle for the names, so a name never hides a feature.
  const dots = svg.querySelectorAll('circle.crater-reached, circle.crater-missed');
  const obstacles = [...dots].map((d) => { const x = +d.getAttribute('cx'), y = +d.getAttribute('cy'); return { x0: x - 4, x1: x + 4, y0: y - 4, y1: y + 4 }; });
  placeLabels(svg, shown.map(({ f, x, y }) => ({ x, y, text: f.name, cls: 'chart-label crater-name' })), { x0: 0, y0: 0, x1: W, y1: H }, obstacles, [c, c]);
}

/**
 * Names beside points: first tries close offsets around the point, then outward from the centre; a leader line joins
 * a name to its point when it had to move away.
 */
export function placeLabels(svg, items, frame, obstacles, [cx, cy]) {
  const labels = items.map(({ x, y, text }) => {
    const width = textWidth(text);
    const d = Math.hypot(x - cx, y - cy) || 1;
    const [ux, uy] = [(x - cx) / d, (y - cy) / d];
    const near = [[width / 2 + 6, 4], [-width / 2 - 6, 4], [0, -8], [0, 16],
      [width / 2, -9], [-width / 2, -9], [width / 2, 17], [-width / 2, 17], [0, -22], [0, 30]];
    const out = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12].map((k) => [ux * 18 * k + (ux >= 0 ? width / 2 : -width / 2), uy * 18 * k + 4]);
    return { x, y, width, candidates: [...near, ...out] };
  });
  const spots = placeFree(labels, frame, obstacles);
  items.forEach((item, i) => {
    const s = spots[i];
    const half = labels[i].width / 2;
    const endX = Math.min(Math.max(item.x, s.x - half), s.x + half);
    const endY = Math.min(Math.max(item.y, s.y - 12), s.y + 3);
    if (Math.hypot(endX - item.x, endY - item.y) > 7) svg.appendChild(el('line', { x1: item.x, y1: item.y, x2: endX, y2: endY, class: 'leader' }));
    svg.appendChild(el('text', { x: s.x, y: s.y, 'text-anchor': 'middle', class: item.cls }, item.text));
  });
}

function render(section, answer) {
  section.replaceChildren();
  section.appendChild(element('h2', { id: 'craters-title' }, 'When the umbra reaches each crater'));
  const zone = answer.site ? answer.site.timeZone : 'UTC';
  section.appendChild(element('p', { class: 'help' },
    `Times in ${zone}, the same instant for everyone (±${answer.deltaTUncertaintySeconds} s from ΔT), ${answer.shadowModel} shadow. ` +
    `${answer.reachedCount} of ${answer.features.length} features are reached, listed below in the order the umbra reaches them.`));
  const figure = element('figure', { class: 'chart' });
  figure.appendChild(element('figcaption', {}, 'The features on the Moon as a lunar map shows it (north up, Mare Crisium to the right). Filled: reached by the umbra; ring: not reached. Ten well-known ones are named; point at a dot for its name and times.'));
  const svg = element('svg:svg', { id: 'crater-disc', role: 'img', 'aria-label': 'Lunar features timed at this eclipse' });
  figure.appendChild(svg);
  section.appendChild(figure);
  drawDisc(svg, answer.features);

  const wrap = element('div', { class: 'table-wrap' });
  const table = element('table', { id: 'crater-table' });
  table.appendChild(element('caption', { class: 'visually-hidden' }, 'Umbral immersion and emersion of lunar features'));
  const head = element('thead');
  const tr = element('tr');
  for (const [h, cls] of [['Feature'], ['Umbra arrives'], ['Umbra leaves'], ['Moon up'], ['Position angle', 'pa']]) tr.appendChild(element('th', cls ? { scope: 'col', class: cls } : { scope: 'col' }, h));
  head.appendChild(tr);
  table.appendChild(head);
  const body = element('tbody');
  for (const f of answer.features) {
    const row = element('tr', f.reachedByUmbra ? {} : { class: 'crater-missed-row' });
    row.appendChild(element('td', {}, f.name));
    row.appendChild(element('td', {}, f.reachedByUmbra ? clock(f.immersion) : 'not reached'));
    row.appendChild(element('td', {}, f.reachedByUmbra ? clock(f.emersion) : '—'));
    const up = f.immersion?.visible;
    row.appendChild(element('td', {}, up === undefined || up === null ? '—' : (up ? 'yes' : 'no')));
    row.appendChild(element('td', { class: 'pa' }, f.immersion ? `${Math.round(f.immersion.positionAngleDegrees) % 360}°` : '—'));
    body.appendChild(row);
  }
  table.appendChild(body);
  wrap.appendChild(table);
  section.appendChild(wrap);

  const links = element('p', { class: 'exports' });
  const csv = element('a', { href: answer.csvUrl, download: `craters-${answer.date}.csv` }, 'Crater timings (CSV)');
  const ics = element('a', { href: answer.icsUrl, download: `craters-${answer.date}.ics` }, 'Calendar for Tycho, Plato, Copernicus and Aristarchus');
  links.append(csv, ' · ', ics);
  section.appendChild(links);
}

/** The crater timings for an eclipse (with the site's visibility when a site is given). */
export async function loadCraters(date, site) {
  const url = cratersUrl(date, site);
  const answer = await getJson(url);
  const join = url.includes('?') ? '&' : '?';
  answer.csvUrl = `${url}${join}format=csv`;
  answer.icsUrl = `${url}${join}format=ics&features=Tycho,Plato,Copernicus,Aristarchus`;
  return answer;
}

/** Fills <section id="craters"> with the table and disc for the answer, or a plain message on failure. */
export function showCraters(answer, error) {
  const section = $('craters');
  if (!section) return;
  section.hidden = false;
  if (error) section.replaceChildren(element('p', { class: 'help' }, `Crater timings: ${error.message ?? error}`));
  else if (!answer) section.replaceChildren(element('p', { class: 'help' }, 'Computing crater timings…'));
  else render(section, answer);
}

/** Hides the section (when the page shows an error instead of a result). */
export function hideCraters() {
  const section = $('craters');
  if (section) section.hidden = true;
}
