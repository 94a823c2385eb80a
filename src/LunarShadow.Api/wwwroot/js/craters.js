// Crater timings for the chosen eclipse: a table of when the umbra's edge reaches and leaves named features, and a
// small disc chart of where they lie. Self-contained: it listens to the plan form and fills <section id="craters">.
import { getJson } from './api.js';

const $ = (id) => document.getElementById(id);
const svgNs = 'http://www.w3.org/2000/svg';

function cratersUrl(date, site) {
  const q = new URLSearchParams();
  for (const key of ['lat', 'lon', 'tz']) if (site[key]) q.set(key, site[key]);
  const query = q.toString();
  return `/api/v1/eclipses/${encodeURIComponent(date)}/craters${query ? '?' + query : ''}`;
}

function element(name, attributes = {}, text) {
  const e = name.startsWith('svg:') ? document.createElementNS(svgNs, name.slice(4)) : document.createElement(name);
  for (const [k, v] of Object.entries(attributes)) e.setAttribute(k, v);
  if (text !== undefined) e.textContent = text;
  return e;
}

const clock = (crossing) => crossing ? (crossing.local ?? crossing.utc).slice(11, 19) : '—';

// The disc as a lunar map shows it (selenographic north up, east to the right, no libration): orthographic projection.
function drawDisc(svg, features) {
  svg.replaceChildren();
  svg.appendChild(element('svg:circle', { cx: 0, cy: 0, r: 100, class: 'crater-disc' }));
  let order = 0;
  for (const f of features) {
    const lat = f.latitudeDegrees * Math.PI / 180;
    const lon = f.longitudeDegrees * Math.PI / 180;
    if (Math.cos(lat) * Math.cos(lon) < 0) continue;
    const x = 100 * Math.cos(lat) * Math.sin(lon);
    const y = -100 * Math.sin(lat);
    const dot = element('svg:circle', { cx: x.toFixed(1), cy: y.toFixed(1), r: 3, class: f.reachedByUmbra ? 'crater-reached' : 'crater-missed' });
    dot.appendChild(element('svg:title', {}, f.reachedByUmbra ? `${f.name}: umbra ${clock(f.immersion)}–${clock(f.emersion)}` : `${f.name}: not reached by the umbra`));
    svg.appendChild(dot);
    if (f.reachedByUmbra && ++order <= 12) svg.appendChild(element('svg:text', { x: (x + 4).toFixed(1), y: (y - 3).toFixed(1), class: 'crater-label' }, String(order)));
  }
}

function render(section, answer) {
  section.replaceChildren();
  section.appendChild(element('h2', { id: 'craters-title' }, 'When the umbra reaches each crater'));
  const zone = answer.site ? answer.site.timeZone : 'UTC';
  section.appendChild(element('p', { class: 'help' },
    `Times in ${zone}, the same instant for everyone (±${answer.deltaTUncertaintySeconds} s from ΔT), ${answer.shadowModel} shadow. ` +
    `${answer.reachedCount} of ${answer.features.length} features are reached; the numbers on the disc give the order.`));
  const figure = element('figure', { class: 'chart' });
  figure.appendChild(element('figcaption', {}, 'The features on the Moon (north up, Mare Crisium to the right); filled: reached by the umbra.'));
  const svg = element('svg:svg', { id: 'crater-disc', viewBox: '-110 -110 220 220', role: 'img', 'aria-label': 'Lunar features timed at this eclipse' });
  figure.appendChild(svg);
  section.appendChild(figure);
  drawDisc(svg, answer.features);

  const wrap = element('div', { class: 'table-wrap' });
  const table = element('table', { id: 'crater-table' });
  table.appendChild(element('caption', { class: 'visually-hidden' }, 'Umbral immersion and emersion of lunar features'));
  const head = element('thead');
  const tr = element('tr');
  for (const h of ['Feature', 'Umbra reaches it', 'Leaves the umbra', 'Moon up', 'Position angle']) tr.appendChild(element('th', { scope: 'col' }, h));
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
    row.appendChild(element('td', {}, f.immersion ? `${f.immersion.positionAngleDegrees.toFixed(0)}°` : '—'));
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

async function showCraters() {
  const section = $('craters');
  const date = $('eclipse-date')?.value.trim() || $('eclipse')?.value;
  if (!section || !date) return;
  const site = { lat: $('lat')?.value.trim(), lon: $('lon')?.value.trim(), tz: $('tz')?.value.trim() };
  section.hidden = false;
  section.replaceChildren(element('p', { class: 'help' }, 'Computing crater timings…'));
  try {
    const url = cratersUrl(date, site);
    const answer = await getJson(url);
    const join = url.includes('?') ? '&' : '?';
    answer.csvUrl = `${url}${join}format=csv`;
    answer.icsUrl = `${url}${join}format=ics&features=Tycho,Plato,Copernicus,Aristarchus`;
    render(section, answer);
  } catch (error) {
    section.replaceChildren(element('p', { class: 'help' }, `Crater timings: ${error.message}`));
  }
}

$('plan')?.addEventListener('submit', () => { showCraters(); });
