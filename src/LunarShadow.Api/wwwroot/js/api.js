// Talks to the LunarShadow API and builds the URLs the page offers.

/** A failed request: the problem response's message, its per-field errors and the HTTP status. */
export class ApiError extends Error {
  constructor(message, status, fields) {
    super(message);
    this.status = status;
    this.fields = fields ?? {};
  }
}

export async function getJson(url) {
  let response;
  try {
    response = await fetch(url, { headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError('The service could not be reached. Check the connection and try again.', 0);
  }
  const body = await response.json().catch(() => ({}));
  if (!response.ok) {
    const message = body.detail || body.title || `The service answered ${response.status}.`;
    throw new ApiError(message, response.status, body.errors);
  }
  return body;
}

export const SITE_KEYS = ['lat', 'lon', 'elevation', 'tz', 'horizon', 'open'];

export function siteQuery(site) {
  const q = new URLSearchParams({ lat: site.lat, lon: site.lon });
  if (site.elevation && site.elevation !== '0') q.set('elevation', site.elevation);
  if (site.tz) q.set('tz', site.tz);
  if (site.horizon) q.set('horizon', site.horizon);
  if (site.open) q.set('open', site.open);
  return q;
}

const withExtra = (q, extra) => { for (const [k, v] of Object.entries(extra)) q.set(k, v); return q; };
const day = (date) => encodeURIComponent(date);

export const localUrl = (date, site, extra = {}) => `/api/v1/eclipses/${day(date)}/local?${withExtra(siteQuery(site), extra)}`;
export const photoUrl = (date, site, camera, extra = {}) => {
  const q = siteQuery(site);
  q.delete('open');
  return `/api/v1/eclipses/${day(date)}/photo-plan?${withExtra(withExtra(q, camera), extra)}`;
};
export const eclipseUrl = (date) => `/api/v1/eclipses/${day(date)}`;
export const mapUrl = (date) => `/api/v1/eclipses/${day(date)}/visibility-map`;

/** ISO date shifted by whole years (astronomical years, so negative years work). */
export function shiftYears(date, years) {
  const m = /^(-?\d{4,6})-(\d\d)-(\d\d)$/.exec(date);
  if (!m) return date;
  const y = Number(m[1]) + years;
  const sign = y < 0 ? '-' : '';
  return `${sign}${String(Math.abs(y)).padStart(4, '0')}-${m[2]}-${m[3] === '29' && m[2] === '02' ? '28' : m[3]}`;
}

export const eclipsesUrl = (from, to) => `/api/v1/eclipses?from=${from}&to=${to}`;
export const upcomingUrl = (from, years) => eclipsesUrl(from, shiftYears(from, years));
export const visibleUrl = (site, from, count) => {
  const q = siteQuery(site);
  q.delete('open');
  q.set('from', from);
  q.set('count', count);
  return `/api/v1/sites/upcoming?${q}`;
};
