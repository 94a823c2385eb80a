// The Moon's path through the penumbra and umbra, seen from the Earth's centre; north up, east left. Each Moon is
// labelled beside its disc on the side away from the path, moved outward (with a leader line) until no label overlaps.
import { el, reset, widthOf, textWidth, box, placeFree } from './svg.js';
import { contactLabel } from './timeline.js';

export function drawShadow(svg, eclipse) {
  const S = Math.min(widthOf(svg), 460);
  reset(svg, 'The Moon\'s path through the Earth\'s shadow', S, S);
  const d = eclipse.shadowDiagram;
  const c = S / 2;
  const reach = Math.max(d.penumbraRadiusDegrees, ...d.points.map((p) => Math.hypot(p.eastDegrees, p.northDegrees))) + d.moonRadiusDegrees;
  const scale = (c - 46) / reach;
  const px = (p) => c - p.eastDegrees * scale, py = (p) => c - p.northDegrees * scale;
  svg.appendChild(el('circle', { cx: c, cy: c, r: d.penumbraRadiusDegrees * scale, class: 'penumbra' }));
  svg.appendChild(el('circle', { cx: c, cy: c, r: d.umbraRadiusDegrees * scale, class: 'umbra' }));
  svg.appendChild(el('polyline', { points: d.points.map((p) => `${px(p)},${py(p)}`).join(' '), fill: 'none', class: 'moon-path' }));
  const r = d.moonRadiusDegrees * scale;
  for (const p of d.points) {
    svg.appendChild(el('circle', { cx: px(p), cy: py(p), r, class: p.name === 'greatest' ? 'moon-disc moon-greatest' : 'moon-disc' }));
  }
  // Compass letters first: they are obstacles for the contact labels.
  const fixed = [['N', c, 16], ['E', 12, c + 4], ['S', c, S - 6], ['W', S - 12, c + 4]];
  const obstacles = [];
  for (const [t, x, y] of fixed) {
    svg.appendChild(el('text', { x, y, 'text-anchor': 'middle', class: 'chart-label compass' }, t));
    obstacles.push(box(x, y, textWidth(t)));
  }
  // Each label goes perpendicular to the path, on alternate sides, a little beyond the disc.
  const first = d.points[0], last = d.points[d.points.length - 1];
  const along = [last.eastDegrees - first.eastDegrees, last.northDegrees - first.northDegrees];
  const len = Math.hypot(...along) || 1;
  const normal = [along[1] / len, along[0] / len]; // screen coordinates: x = -east, y = -north
  const labels = d.points.map((p, i) => {
    const side = i % 2 === 0 ? 1 : -1;
    const dist = r + 12;
    const [nx, ny] = [normal[0] * side, normal[1] * side];
    return {
      x: px(p), y: py(p) + 4, width: textWidth(contactLabel(p.name)),
      candidates: [[nx * dist, ny * dist], [-nx * dist, -ny * dist], [nx * (dist + 16), ny * (dist + 16)], [-nx * (dist + 16), -ny * (dist + 16)]],
    };
  });
  const spots = placeFree(labels, { x0: 0, y0: 0, x1: S, y1: S }, obstacles);
  d.points.forEach((p, i) => {
    const s = spots[i];
    const dx = s.x - px(p), dy = s.y - 4 - py(p), dist = Math.hypot(dx, dy) || 1;
    if (dist > r + 8) {
      svg.appendChild(el('line', { x1: px(p) + dx / dist * r, y1: py(p) + dy / dist * r, x2: s.x - dx / dist * 8, y2: s.y - 4 - dy / dist * 8, class: 'leader' }));
    }
    svg.appendChild(el('text', { x: s.x, y: s.y, 'text-anchor': 'middle', class: 'chart-label contact-label' }, contactLabel(p.name)));
  });
}
