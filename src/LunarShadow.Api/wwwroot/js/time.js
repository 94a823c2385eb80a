// Local wall-clock time read from the API's ISO 8601 strings (which carry their UTC offset), and zone names from Intl.
const LOCAL = /^(-?\d{4,6})-(\d\d)-(\d\d)T(\d\d):(\d\d)(?::(\d\d))?/;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const DAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

/** The UTC offset of an ISO 8601 instant, minutes east of Greenwich (0 for "Z"). */
export function offsetMinutes(iso) {
  const m = /([+-])(\d\d):(\d\d)$/.exec(iso);
  return m ? (m[1] === '-' ? -1 : 1) * (Number(m[2]) * 60 + Number(m[3])) : 0;
}

/** The wall clock of a local ISO string: { date: 'YYYY-MM-DD', hm: 'HH:MM', hms: 'HH:MM:SS' }. */
export function wallClock(iso) {
  const m = LOCAL.exec(iso);
  if (!m) return { date: iso, hm: iso, hms: iso };
  return { date: `${m[1]}-${m[2]}-${m[3]}`, hm: `${m[4]}:${m[5]}`, hms: `${m[4]}:${m[5]}:${m[6] ?? '00'}` };
}

/** 'UTC+01:00' for 60. */
export function utcOffsetText(minutes) {
  const sign = minutes < 0 ? '−' : '+';
  const a = Math.abs(minutes);
  return `UTC${sign}${String(Math.floor(a / 60)).padStart(2, '0')}:${String(a % 60).padStart(2, '0')}`;
}

/** The zone's short name at an instant ('CET', 'EDT'), or the UTC offset where Intl has no name. */
export function zoneAbbreviation(timeZone, utcMs, offset, given) {
  if (given) return given;
  // Intl names a zone only in locales where it is in common use, so ask a few English-speaking ones.
  for (const locale of ['en-GB', 'en-US', 'en-AU', 'en-NZ', 'en-IE', 'en-IN', 'en-ZA', 'en-CA']) {
    try {
      const parts = new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' }).formatToParts(new Date(utcMs));
      const name = parts.find((p) => p.type === 'timeZoneName')?.value;
      if (name && !/^(GMT|UTC)/.test(name)) return name;
      if (name === 'GMT' || name === 'UTC') return name;
    } catch { return utcOffsetText(offset); /* an id this browser does not know */ }
  }
  return utcOffsetText(offset);
}

/** 'Thu 20 Dec 2029' for '2029-12-20' (weekday only in the Gregorian calendar, from 1583). */
export function longDate(date, withYear = true) {
  const m = /^(-?\d{4,6})-(\d\d)-(\d\d)$/.exec(date);
  if (!m) return date;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  let text = `${d} ${MONTHS[mo - 1]}${withYear ? ' ' + m[1].replace(/^0+(?=\d)/, '') : ''}`;
  if (y >= 1583) {
    const day = new Date(0);
    day.setUTCFullYear(y, mo - 1, d);
    text = `${DAYS[day.getUTCDay()]} ${text}`;
  }
  return text;
}

/** The local calendar date of a UTC instant in a zone ('YYYY-MM-DD'), or the UTC date if the zone is unknown here. */
export function localDateOf(utcIso, timeZone) {
  try {
    const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(new Date(utcIso));
    const get = (t) => parts.find((p) => p.type === t)?.value;
    if (Date.parse(utcIso) > Date.UTC(1583, 0, 1)) return `${get('year')}-${get('month')}-${get('day')}`;
  } catch { /* fall through */ }
  return utcIso.slice(0, 10);
}

/** A function giving the UTC offset (minutes) at any instant, read from the nearest of a list of local ISO strings. */
export function offsetLookup(locals) {
  const points = locals.map((l) => [Date.parse(l), offsetMinutes(l)]).sort((a, b) => a[0] - b[0]);
  return (ms) => {
    let best = points[0];
    for (const p of points) if (p[0] <= ms) best = p;
    return best ? best[1] : 0;
  };
}
