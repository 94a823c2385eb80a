// The embeddable card: ?date=YYYY-MM-DD&lat=…&lon=…&tz=…&theme=dark|light
import { getJson, localUrl } from './api.js';

const params = new URLSearchParams(window.location.search);
const $ = (id) => document.getElementById(id);
if (params.get('theme') === 'light') document.body.classList.add('light');
const site = { lat: params.get('lat') ?? '', lon: params.get('lon') ?? '', elevation: params.get('elevation') ?? '', tz: params.get('tz') ?? '', horizon: params.get('horizon') ?? '', open: params.get('open') ?? '' };
const date = params.get('date') ?? '';
$('more').href = `/?${params}`;
getJson(localUrl(date, site)).then((local) => {
  $('embed-title').textContent = `${local.eclipse.kind[0].toUpperCase()}${local.eclipse.kind.slice(1)} lunar eclipse, ${local.eclipse.date}`;
  $('summary').textContent = local.summary;
  const body = $('contacts').querySelector('tbody');
  for (const c of local.contacts) {
    const tr = document.createElement('tr');
    for (const text of [c.name, c.local.slice(11, 16), `${c.altitudeDegrees.toFixed(0)}°`, c.visible ? 'yes' : 'no']) {
      tr.appendChild(Object.assign(document.createElement('td'), { textContent: text }));
    }
    body.appendChild(tr);
  }
}).catch((error) => { $('summary').textContent = error.message; });
