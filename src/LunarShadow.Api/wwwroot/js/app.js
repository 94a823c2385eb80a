// The page: choose an eclipse and a site, then draw what that site sees. Opens on an example; every result has a URL.
import { getJson, localUrl, eclipseUrl, mapUrl, upcomingUrl, visibleUrl, eclipsesUrl, shiftYears, siteQuery, SITE_KEYS, ApiError } from './api.js';
import { drawTimeline } from './timeline.js';
import { drawShadow } from './shadow.js';
import { drawMap } from './worldmap.js';
import { wallClock, longDate, localDateOf, zoneAbbreviation, offsetMinutes, utcOffsetText } from './time.js';
import { showPhotoSection } from './photo.js';
import { loadCraters, showCraters, hideCraters } from './craters.js';

const $ = (id) => document.getElementById(id);

// The invented Hollowmere Hill Public Observatory, and an eclipse it can show its visitors in full.
export const EXAMPLE = { date: '2029-12-20', lat: '47.31', lon: '11.42', elevation: '1120', tz: 'Europe/Vienna', horizon: '', open: '20:00-01:00' };

let land = null;
let last = null;
let listKey = '';
let craterRequest = 0;

const site = () => Object.fromEntries(SITE_KEYS.map((k) => [k, $(k).value.trim()]));
const chosenDate = () => $('eclipse-date').value.trim() || $('eclipse').value;

/** The list of coming eclipses, each with its local date at the site and whether the site can see it. */
async function loadEclipses(s) {
  const key = `${s.lat}|${s.lon}|${s.elevation}|${s.tz}|${s.horizon}`;
  if (key === listKey) return;
  listKey = key;
  const today = new Date().toISOString().slice(0, 10);
  try {
    const [list, visible] = await Promise.all([
      getJson(upcomingUrl(today, 15)),
      getJson(visibleUrl(s, today, 40)).catch(() => null),
    ]);
    const seen = new Map((visible?.eclipses ?? []).map((e) => [e.date, e]));
    const select = $('eclipse');
    select.innerHTML = '';
    for (const e of list.eclipses) {
      const v = seen.get(e.date);
      const localDate = v ? wallClock(v.greatestEclipseLocal).date : localDateOf(e.greatestEclipse.utc, s.tz || 'UTC');
      const mark = visible === null ? '' : v ? ' · ✓ visible' : ' · not visible here';
      const option = document.createElement('option');
      option.value = e.date;
      option.textContent = `${longDate(localDate)} (local) · ${e.kind}, magnitude ${e.umbralMagnitude.toFixed(2)}${mark}`;
      option.dataset.visible = v ? 'yes' : 'no';
      select.appendChild(option);
    }
  } catch {
    $('eclipse').innerHTML = '<option value="">Could not load the list</option>';
    listKey = '';
  }
  syncList();
}

/** Keeps the list showing the date in the field; a date outside the list gets its own entry at the top. */
function syncList() {
  const date = $('eclipse-date').value.trim();
  const select = $('eclipse');
  select.querySelector('option[data-typed]')?.remove();
  if (!date) return;
  if (![...select.options].some((o) => o.value === date)) {
    const option = Object.assign(document.createElement('option'), { value: date, textContent: `${date} (UTC) · typed in` });
    option.dataset.typed = 'yes';
    select.insertBefore(option, select.firstChild);
  }
  select.value = date;
}

function row(cells, labels) {
  const tr = document.createElement('tr');
  cells.forEach(([text, cls], i) => {
    const td = document.createElement(i === 0 ? 'th' : 'td');
    if (i === 0) td.scope = 'row';
    td.textContent = text;
    td.dataset.label = labels[i];
    if (cls) td.className = cls;
    tr.appendChild(td);
  });
  return tr;
}

function clearError() {
  $('error').hidden = true;
  for (const k of SITE_KEYS.concat(['eclipse-date'])) $(k).removeAttribute('aria-invalid');
}

const FIELD_INPUT = { lat: 'lat', lon: 'lon', elevation: 'elevation', tz: 'tz', horizon: 'horizon', open: 'open', date: 'eclipse-date' };

/** Shows a failure as an error panel, hides the charts, and for a date without an eclipse offers the nearest ones. */
async function showError(error, date, s) {
  $('result').hidden = true;
  $('photo').hidden = true;
  craterRequest++;
  hideCraters();
  $('error').hidden = false;
  // A missing eclipse: say so in plain words; the nearest eclipses follow as links.
  const named = Object.keys(error.fields ?? {}).length > 0;
  $('error-message').textContent = error.status === 404 ? `${error.message.split('. ')[0]}.`
    : named ? 'Please correct the marked fields:' : error.message;
  const fields = $('error-fields');
  fields.innerHTML = '';
  for (const [field, messages] of Object.entries(error.fields ?? {})) {
    const input = FIELD_INPUT[field];
    if (input) $(input).setAttribute('aria-invalid', 'true');
    for (const m of messages) fields.appendChild(Object.assign(document.createElement('li'), { textContent: m }));
  }
  $('nearest').hidden = true;
  if (location.search) $('error').scrollIntoView({ block: 'start' });
  if (error.status === 404 && /^-?\d{4}-\d\d-\d\d$/.test(date)) {
    try {
      const around = await getJson(eclipsesUrl(shiftYears(date, -2), shiftYears(date, 2)));
      const before = around.eclipses.filter((e) => e.date < date).slice(-2);
      const after = around.eclipses.filter((e) => e.date > date).slice(0, 2);
      const list = $('nearest-list');
      list.innerHTML = '';
      for (const e of [...before, ...after]) {
        const q = siteQuery(s);
        q.set('date', e.date);
        const a = Object.assign(document.createElement('a'), { href: `?${q}`, textContent: `${e.date} — ${e.kind} eclipse` });
        a.addEventListener('click', (ev) => { ev.preventDefault(); $('eclipse-date').value = e.date; show(); });
        list.appendChild(document.createElement('li')).appendChild(a);
      }
      $('nearest').hidden = list.children.length === 0;
    } catch { /* the error itself is already shown */ }
  }
}

function drawAll() {
  if (!last) return;
  const { local, eclipse, map, s } = last;
  drawTimeline($('timeline-chart'), local, eclipse);
  drawShadow($('shadow-diagram'), eclipse, last.craters);
  drawMap($('world-map'), land, map, { lat: Number(s.lat), lon: Number(s.lon) });
}

/** The shareable address of the current choice. */
function shareUrl(date, s) {
  const q = siteQuery(s);
  q.set('date', date);
  return `${location.pathname}?${q}`;
}

export async function show(event) {
  event?.preventDefault();
  const date = chosenDate();
  const s = site();
  clearError();
  syncList();
  if (event) history.pushState(null, '', shareUrl(date, s));
  $('summary').textContent = 'Computing…';
  try {
    if (!date) throw new ApiError('Choose an eclipse from the list or type the date of greatest eclipse (YYYY-MM-DD).', 400, { date: ['date is required, YYYY-MM-DD.'] });
    const local = await getJson(localUrl(date, s, { track: 10 }));
    const [eclipse, map] = await Promise.all([getJson(eclipseUrl(date)), getJson(mapUrl(date))]);
    land ??= await getJson('data/land-110m.geojson');
    last = { local, eclipse, map, s, date };
    $('result').hidden = false;
    const g = local.contacts.find((c) => c.name === 'greatest') ?? local.contacts[0];
    const offset = offsetMinutes(g.local);
    const zone = zoneAbbreviation(local.site.timeZone, Date.parse(g.utc), offset, local.site.zoneAbbreviation);
    $('result-when').textContent = `${local.eclipse.kind[0].toUpperCase()}${local.eclipse.kind.slice(1)} eclipse of ${longDate(wallClock(g.local).date)} (local), times in ${local.site.timeZone} — ${zone}${zone.startsWith('UTC') ? '' : ', ' + utcOffsetText(offset)}.`;
    $('summary').textContent = local.summary + (local.publicNight?.note ? ' ' + local.publicNight.note : '');
    $('cautions').innerHTML = '';
    for (const c of local.cautions) $('cautions').appendChild(Object.assign(document.createElement('li'), { textContent: c }));
    drawAll();
    contactTable(local);
    exportsFor(date, s);
    loadEclipses(s);
    showPhotoSection(date, s);
    craterTimings(date, s);
    if (event) $('result').scrollIntoView({ block: 'start' });
  } catch (error) {
    await showError(error instanceof ApiError ? error : new ApiError(String(error.message ?? error), 0), date, s);
  }
}

/** Crater timings come after the rest (they take longer); the shadow diagram is redrawn with the features. */
function craterTimings(date, s) {
  const request = ++craterRequest;
  showCraters(null);
  loadCraters(date, s).then((answer) => {
    if (request !== craterRequest || !last) return;
    last.craters = answer;
    showCraters(answer);
    drawShadow($('shadow-diagram'), last.eclipse, answer);
  }).catch((error) => { if (request === craterRequest) showCraters(null, error); });
}

function contactTable(local) {
  const labels = [...$('contacts').querySelectorAll('thead th')].map((th) => th.textContent);
  const body = $('contacts').querySelector('tbody');
  body.innerHTML = '';
  const firstDate = wallClock(local.contacts[0].local).date;
  const notes = new Set();
  for (const c of local.contacts) {
    const w = wallClock(c.local);
    const dayMark = w.date !== firstDate ? ` (${longDate(w.date, false)})` : '';
    if (c.localNote) notes.add(c.localNote);
    body.appendChild(row([
      [c.name === 'greatest' ? 'greatest' : c.name], [`${w.hms}${dayMark}${c.localNote ? ' †' : ''}`], [`${c.altitudeDegrees.toFixed(1)}°`], [`${c.azimuthDegrees.toFixed(0)}°`],
      [c.visible ? 'yes' : 'no', c.visible ? '' : 'no'], [c.sky.replace(/-/g, ' ')], [c.zenithPositionAngleDegrees == null ? '—' : `${c.zenithPositionAngleDegrees.toFixed(0)}°`],
    ], labels));
  }
  $('contact-notes').textContent = notes.size ? `† ${[...notes].join(' ')}` : '';
}

function exportsFor(date, s) {
  const list = $('exports');
  list.innerHTML = '';
  const links = [
    ['Contacts as CSV', localUrl(date, s, { format: 'csv' }), `eclipse-${date}.csv`],
    ['Add to calendar (iCalendar)', localUrl(date, s, { format: 'ics' }), `eclipse-${date}.ics`],
    ['Everything as JSON', localUrl(date, s), `eclipse-${date}.json`],
    ['Subscribe: eclipses visible from here', `/api/v1/sites/upcoming?${siteQuery(s)}&phase=partial&format=ics`, null],
    ['Link to this page', shareUrl(date, s), null],
  ];
  for (const [label, href, file] of links) {
    const a = Object.assign(document.createElement('a'), { textContent: label, href });
    if (file) a.download = file;
    list.appendChild(document.createElement('li')).appendChild(a);
  }
  embedSnippet(date, s);
}

// The card's own height at 420 px wide with seven contacts (measured); the card also posts its height to the host.
export const EMBED_SIZE = { width: 420, height: 500 };

function embedSnippet(date, s) {
  const q = siteQuery(s);
  q.delete('open');
  q.set('date', date);
  q.set('theme', $('embed-theme').value);
  const src = `${location.origin}/embed.html?${q}`;
  $('embed-code').value =
    `<iframe src="${src.replace(/&/g, '&amp;')}" width="${EMBED_SIZE.width}" height="${EMBED_SIZE.height}" title="Lunar eclipse of ${date}" style="border:0;max-width:100%" data-lunarshadow></iframe>\n` +
    '<script>addEventListener("message",e=>{if(e.data&&e.data.type==="lunarshadow:height")for(const f of document.querySelectorAll("iframe[data-lunarshadow]"))if(f.contentWindow===e.source)f.height=e.data.height})</script>';
}

function locate() {
  if (!navigator.geolocation) return;
  navigator.geolocation.getCurrentPosition((p) => {
    $('lat').value = p.coords.latitude.toFixed(4);
    $('lon').value = p.coords.longitude.toFixed(4);
    if (p.coords.altitude) $('elevation').value = Math.round(p.coords.altitude);
    $('tz').value = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  });
}

function restore() {
  const params = new URLSearchParams(location.search);
  const fromUrl = params.has('lat') || params.has('lon') || params.has('date');
  const values = fromUrl ? Object.fromEntries([...SITE_KEYS, 'date'].map((k) => [k, params.get(k) ?? ''])) : EXAMPLE;
  for (const k of SITE_KEYS) $(k).value = values[k] ?? '';
  if (!$('elevation').value) $('elevation').value = '0';
  if (fromUrl && !values.tz) $('tz').value = '';
  $('eclipse-date').value = values.date ?? '';
  $('example-note').hidden = fromUrl;
}

$('plan').addEventListener('submit', show);
$('locate').addEventListener('click', locate);
$('eclipse').addEventListener('change', () => { $('eclipse-date').value = $('eclipse').value; syncList(); });
$('eclipse-date').addEventListener('input', syncList);
$('embed-theme').addEventListener('change', () => last && embedSnippet(last.date, last.s));
for (const k of SITE_KEYS) $(k).addEventListener('input', () => { $('example-note').hidden = true; });
window.addEventListener('popstate', () => { restore(); show(); });
let resizeTimer;
window.addEventListener('resize', () => { clearTimeout(resizeTimer); resizeTimer = setTimeout(drawAll, 150); });
restore();
loadEclipses(site());
show();
