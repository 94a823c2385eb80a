// Talks to the LunarShadow API and builds the URLs the page offers.
export async function getJson(url) {
  const response = await fetch(url, { headers: { Accept: 'application/json' } });
  const body = await response.json().catch(() => ({}));
  if (!response.ok) {
    const message = body.detail || body.title || `The service answered ${response.status}.`;
    throw new Error(message);
  }
  return body;
}

export function siteQuery(site) {
  const q = new URLSearchParams({ lat: site.lat, lon: site.lon });
  if (site.elevation) q.set('elevation', site.elevation);
  if (site.tz) q.set('tz', site.tz);
  if (site.horizon) q.set('horizon', site.horizon);
  if (site.open) q.set('open', site.open);
  return q;
}

export const localUrl = (date, site, extra = {}) => {
  const q = siteQuery(site);
  for (const [k, v] of Object.entries(extra)) q.set(k, v);
  return `/api/v1/eclipses/${encodeURIComponent(date)}/local?${q}`;
};

export const eclipseUrl = (date) => `/api/v1/eclipses/${encodeURIComponent(date)}`;
export const mapUrl = (date) => `/api/v1/eclipses/${encodeURIComponent(date)}/visibility-map`;
export const upcomingUrl = (from, years) => {
  const to = new Date(from);
  to.setUTCFullYear(to.getUTCFullYear() + years);
  return `/api/v1/eclipses?from=${from}&to=${to.toISOString().slice(0, 10)}`;
};
