// A local-time axis: a tick at every full local hour, hour labels spaced to stay readable, midnight and the date
// change marked, and the zone's name. Shared by the night timeline and the exposure chart.
import { el, textWidth, box, intersects } from './svg.js';
import { longDate, zoneAbbreviation, utcOffsetText } from './time.js';

const HOUR = 3600000;

/**
 * Draws the axis under a plot spanning [top, bottom] and returns the height it used.
 * scale: { x(ms), t0, t1, left, right }; offsetAt(ms) gives the local UTC offset in minutes; timeZone names the zone.
 */
export function drawTimeAxis(svg, scale, offsetAt, timeZone, top, bottom, zoneGiven) {
  const { x, t0, t1 } = scale;
  const g = el('g', { class: 'time-axis' });
  svg.appendChild(g);
  g.appendChild(el('line', { x1: x(t0), x2: x(t1), y1: bottom, y2: bottom, class: 'axis-line' }));
  // Every instant where the local clock shows a full hour.
  const hours = [];
  for (let t = Math.floor(t0 / (15 * 60000)) * 15 * 60000; t <= t1; t += 15 * 60000) {
    if (t < t0) continue;
    const local = t + offsetAt(t) * 60000;
    if (((local % HOUR) + HOUR) % HOUR === 0) hours.push({ t, hour: ((Math.floor(local / HOUR) % 24) + 24) % 24, local });
  }
  const pxPerHour = (x(t0 + HOUR) - x(t0));
  const labelWidth = textWidth('00:00') + 8;
  const step = [1, 2, 3, 4, 6, 12].find((s) => s * pxPerHour >= labelWidth) ?? 12;
  const labelBoxes = [];
  for (const h of hours) {
    const px = x(h.t);
    const midnight = h.hour === 0;
    g.appendChild(el('line', { x1: px, x2: px, y1: bottom, y2: bottom + (midnight ? 9 : 5), class: midnight ? 'hour-tick midnight-tick' : 'hour-tick' }));
    if (midnight) g.appendChild(el('line', { x1: px, x2: px, y1: top, y2: bottom, class: 'midnight-line' }));
    if (h.hour % step === 0) {
      const text = `${String(h.hour).padStart(2, '0')}:00`;
      const b = box(px, bottom + 21, textWidth(text), 'middle');
      if (b.x0 >= 0 && b.x1 <= scale.width && !labelBoxes.some((o) => intersects(o, b))) {
        labelBoxes.push(b);
        g.appendChild(el('text', { x: px, y: bottom + 21, 'text-anchor': 'middle', class: 'chart-label hour-label' }, text));
      }
    }
  }
  // Second row: the local date at the start and at every midnight; the zone's name at the right end.
  const row2 = bottom + 38;
  const placed = [];
  const put = (text, px, anchor, cls, row = row2) => {
    const b = box(px, row, textWidth(text), anchor);
    if (b.x0 < 0 || b.x1 > scale.width || placed.some((o) => intersects(o, b))) return false;
    placed.push(b);
    g.appendChild(el('text', { x: px, y: row, 'text-anchor': anchor, class: `chart-label ${cls}` }, text));
    return true;
  };
  const midOffset = offsetAt((t0 + t1) / 2);
  const zone = zoneAbbreviation(timeZone, (t0 + t1) / 2, midOffset, zoneGiven);
  const zoneText = zone.startsWith('UTC') ? `local time, ${zone}` : `local time, ${zone} (${utcOffsetText(midOffset)})`;
  // The zone on its own row, so that it is never crowded out by a date.
  put(zoneText, x(t1), 'end', 'zone-label', row2 + 17);
  for (const h of hours.filter((h) => h.hour === 0)) {
    const date = new Date(h.local).toISOString().slice(0, 10);
    put(`▸ ${longDate(date, false)}`, x(h.t), 'start', 'date-label');
  }
  const startDate = new Date(t0 + offsetAt(t0) * 60000).toISOString().slice(0, 10);
  put(longDate(startDate, false), x(t0), 'start', 'date-label');
  return 60;
}
