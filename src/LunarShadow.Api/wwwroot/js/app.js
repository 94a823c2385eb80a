// The page: choose an eclipse and a site, then draw what that site sees.
import { getJson, localUrl, eclipseUrl, mapUrl, upcomingUrl, siteQuery } from './api.js';
import { drawTimeline, drawShadow, drawMap } from './charts.js';

const $ = (id) => document.getElementById(id);
let land = null;

function site() {
  return { lat: $('lat').value.trim(), lon: $('lon').value.trim(), elevation: $('elevation').value.trim(), tz: $('tz').value.trim(), horizon: $('horizon').value.trim(), open: $('open').value.trim() };
}

async function loadEclipses() {
  const today = new Date().toISOString().slice(0, 10);
  try {
    const list = await getJson(upcomingUrl(today, 15));
    $('eclipse').innerHTML = '';
    for (const e of list.eclipses) {
      const option = document.createElement('option');
      option.value = e.date;
      option.textContent = `${e.date} — ${e.kind} (umbral magnitude ${e.umbralMagnitude.toFixed(2)})`;
      $('eclipse').appendChild(option);
    }
  } catch (error) {
    $('eclipse').innerHTML = '<option value="">Could not load the list</option>';
  }
}

function row(cells) {
  const tr = document.createElement('tr');
  for (const [text, cls] of cells) {
    const td = document.createElement('td');
    td.textContent = text;
    if (cls) td.className = cls;
    tr.appendChild(td);
  }
  return tr;
}

const clock = (local) => local.slice(11, 19) + ' ' + local.slice(23);

async function show(event) {
  event?.preventDefault();
  const date = $('eclipse-date').value.trim() || $('eclipse').value;
  const s = site();
  $('summary').textContent = 'Computing…';
  $('result').hidden = false;
  try {
    const [local, eclipse, map] = await Promise.all([
      getJson(localUrl(date, s, { track: 10 })), getJson(eclipseUrl(date)), getJson(mapUrl(date)),
    ]);
    land ??= await getJson('data/land-110m.geojson');
    $('summary').textContent = local.summary + (local.publicNight ? ' ' + local.publicNight.note : '');
    $('cautions').innerHTML = '';
    for (const c of local.cautions) $('cautions').appendChild(Object.assign(document.createElement('li'), { textContent: c }));
    drawTimeline($('timeline-chart'), local, eclipse);
    drawShadow($('shadow-diagram'), eclipse);
    drawMap($('world-map'), land, map, { lat: Number(s.lat), lon: Number(s.lon) });
    const body = $('contacts').querySelector('tbody');
    body.innerHTML = '';
    for (const c of local.contacts) {
      body.appendChild(row([
        [c.name], [clock(c.local) + (c.localNote ? ' *' : '')], [`${c.altitudeDegrees.toFixed(1)}°`], [`${c.azimuthDegrees.toFixed(0)}°`],
        [c.visible ? 'yes' : 'no', c.visible ? '' : 'no'], [c.sky.replace('-', ' ')], [c.zenithPositionAngleDegrees == null ? '—' : `${c.zenithPositionAngleDegrees.toFixed(0)}°`],
      ]));
    }
    exports(date, s);
  } catch (error) {
    $('summary').textContent = error.message;
  }
}

function exports(date, s) {
  const origin = window.location.origin;
  const list = $('exports');
  list.innerHTML = '';
  const links = [
    ['Contacts as CSV', localUrl(date, s, { format: 'csv' }), `eclipse-${date}.csv`],
    ['Add to calendar (iCalendar)', localUrl(date, s, { format: 'ics' }), `eclipse-${date}.ics`],
    ['Everything as JSON', localUrl(date, s), `eclipse-${date}.json`],
    ['Subscribe: eclipses visible from here', `/api/v1/sites/upcoming?${siteQuery(s)}&phase=partial&format=ics`, null],
  ];
  for (const [label, href, file] of links) {
    const a = Object.assign(document.createElement('a'), { textContent: label, href });
    if (file) a.download = file;
    list.appendChild(Object.assign(document.createElement('li'), {})).appendChild(a);
  }
  const q = siteQuery(s);
  q.set('date', date);
  q.set('theme', 'dark');
  $('embed-code').value = `<iframe src="${origin}/embed.html?${q}" width="420" height="340" title="Lunar eclipse of ${date}" style="border:0"></iframe>`;
}

function locate() {
  if (!navigator.geolocation) return;
  navigator.geolocation.getCurrentPosition((p) => {
    $('lat').value = p.coords.latitude.toFixed(4);
    $('lon').value = p.coords.longitude.toFixed(4);
    if (p.coords.altitude) $('elevation').value = Math.round(p.coords.altitude);
  });
}

$('tz').value = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
$('plan').addEventListener('submit', show);
$('locate').addEventListener('click', locate);
const params = new URLSearchParams(window.location.search);
for (const key of ['lat', 'lon', 'elevation', 'tz', 'horizon', 'open']) if (params.has(key)) $(key).value = params.get(key);
if (params.has('date')) $('eclipse-date').value = params.get('date');
loadEclipses().then(() => { if (params.has('lat') && params.has('lon')) show(); });
