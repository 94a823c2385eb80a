// The embeddable card: ?date=YYYY-MM-DD&lat=…&lon=…&tz=…&theme=dark|light (the last theme given wins).
// It reports its height to the host page with postMessage({ type: 'lunarshadow:height', height }).
import { getJson, localUrl } from './api.js';
import { wallClock, longDate, zoneAbbreviation, offsetMinutes, utcOffsetText } from './time.js';

const params = new URLSearchParams(window.location.search);
const $ = (id) => document.getElementById(id);
if (params.getAll('theme').at(-1) === 'light') document.body.classList.add('light');
const site = Object.fromEntries(['lat', 'lon', 'elevation', 'tz', 'horizon'].map((k) => [k, params.get(k) ?? '']));
const date = params.get('date') ?? '';
$('more').href = `/?${params}`;

function reportHeight() {
  if (window.parent !== window) window.parent.postMessage({ type: 'lunarshadow:height', height: Math.ceil(document.querySelector('main').getBoundingClientRect().bottom) + 4 }, '*');
}
new ResizeObserver(reportHeight).observe(document.body);

function render(local) {
  const g = local.contacts.find((c) => c.name === 'greatest') ?? local.contacts[0];
  const kind = local.eclipse.kind;
  const greatestDate = wallClock(g.local).date;
  $('embed-title').textContent = `${kind[0].toUpperCase()}${kind.slice(1)} lunar eclipse, ${longDate(greatestDate)}`;
  const offset = offsetMinutes(g.local);
  const zone = zoneAbbreviation(local.site.timeZone, Date.parse(g.utc), offset, local.site.zoneAbbreviation);
  $('embed-when').textContent = `Times in ${local.site.timeZone} (${zone}${zone.startsWith('UTC') ? '' : ', ' + utcOffsetText(offset)}); dates are local.`;
  $('summary').textContent = local.summary;
  const body = $('contacts').querySelector('tbody');
  const firstDate = wallClock(local.contacts[0].local).date;
  for (const c of local.contacts) {
    const w = wallClock(c.local);
    const day = w.date !== firstDate ? ` ${longDate(w.date, false).split(' ')[0]}` : '';
    const tr = document.createElement('tr');
    for (const text of [c.name, `${w.hm}${day}`, `${c.altitudeDegrees.toFixed(0)}°`, c.visible ? 'yes' : 'no']) {
      tr.appendChild(Object.assign(document.createElement('td'), { textContent: text }));
    }
    body.appendChild(tr);
  }
  $('table-wrap').hidden = false;
}

if (!date || !site.lat || !site.lon) {
  $('embed-title').textContent = 'Lunar eclipse card';
  $('summary').textContent = 'Nothing to show yet: this card needs an eclipse date and a site.';
  $('needs').hidden = false;
  reportHeight();
} else {
  getJson(localUrl(date, site)).then(render).catch((error) => {
    $('summary').textContent = `This card could not be filled: ${error.message}`;
    $('summary').classList.add('error-text');
    $('needs').hidden = false;
  }).finally(reportHeight);
}
