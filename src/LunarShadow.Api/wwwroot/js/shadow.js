// The Moon's path through the penumbra and umbra, seen from the Earth's centre; north up, east left. Each Moon is
// labelled beside its disc on the side away from the path, moved outward (with a leader line) until no label overlaps.
// With crater timings, a panel below shows the Moon at greatest eclipse enlarged, the shadow on it, the timed
// features dotted where they lie and a few well-known ones named.
import { el, reset, widthOf, textWidth, box, placeFree } from './svg.js';
import { contactLabel } from './timeline.js';
import { HEADLINE_FEATURES, placeLabels } from './craters.js';

export function drawShadow(svg, eclipse, craters) {
  const S = Math.min(widthOf(svg), 460);
  const panel = craters ? Math.round(S * 0.62) : 0;
  reset(svg, 'The Moon\'s path through the Earth\'s shadow', S, S + panel);
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
  const greatest = d.points.find((p) => p.name === 'greatest');
  if (craters && greatest) drawEnlarged(svg, d, craters, { S, top: S, height: panel, scale, greatest });
}

// The Moon at greatest eclipse, enlarged below the diagram in the same orientation (north up, east left): the penumbra
// and umbra clipped to its disc, the features where they lie then (offsets from the shadow axis in the diagram's own
// frame, from the crater endpoint), the well-known ones named around it.
function drawEnlarged(svg, d, craters, { S, top, height, scale, greatest }) {
  const g = el('g', { class: 'enlarged' });
  svg.appendChild(g);
  g.appendChild(el('line', { x1: 8, x2: S - 8, y1: top + 0.5, y2: top + 0.5, class: 'grid-line' }));
  const title = 'The Moon at greatest eclipse, enlarged';
  g.appendChild(el('text', { x: 10, y: top + 18, class: 'chart-label enlarged-title' }, title));
  const R = Math.max(40, Math.min(S / 2 - 92, height / 2 - 24));
  const C = { x: S / 2, y: top + 26 + (height - 26) / 2 };
  const k = R / (d.moonRadiusDegrees * scale);
  const X = (p) => C.x - (p.eastDegrees - greatest.eastDegrees) * scale * k;
  const Y = (p) => C.y - (p.northDegrees - greatest.northDegrees) * scale * k;
  const axis = { eastDegrees: 0, northDegrees: 0 };
  const clip = el('clipPath', { id: 'enlarged-moon' });
  clip.appendChild(el('circle', { cx: C.x, cy: C.y, r: R }));
  g.appendChild(el('defs')).appendChild(clip);
  const shade = el('g', { 'clip-path': 'url(#enlarged-moon)' });
  shade.appendChild(el('rect', { x: C.x - R, y: C.y - R, width: 2 * R, height: 2 * R, class: 'moon-lit' }));
  shade.appendChild(el('circle', { cx: X(axis), cy: Y(axis), r: d.penumbraRadiusDegrees * scale * k, class: 'penumbra' }));
  shade.appendChild(el('circle', { cx: X(axis), cy: Y(axis), r: d.umbraRadiusDegrees * scale * k, class: 'umbra' }));
  g.appendChild(shade);
  g.appendChild(el('circle', { cx: C.x, cy: C.y, r: R, class: 'moon-disc moon-enlarged' }));
  const named = [];
  // The names go around the disc, not on it, so every dot stays readable.
  const obstacles = [box(10, top + 18, textWidth(title), 'start'), { x0: C.x - R - 3, x1: C.x + R + 3, y0: C.y - R - 3, y1: C.y + R + 3 }];
  const count = S < 400 ? 6 : 8;
  for (const f of craters.features) {
    const at = f.atGreatest;
    if (!at || !at.facesEarth) continue;
    const x = X(at), y = Y(at);
    const dot = el('circle', { cx: x.toFixed(1), cy: y.toFixed(1), r: 2.6, class: f.reachedByUmbra ? 'feature-dot' : 'feature-dot feature-missed' });
    dot.appendChild(el('title', {}, f.name));
    g.appendChild(dot);
    obstacles.push({ x0: x - 3, x1: x + 3, y0: y - 3, y1: y + 3 });
    const rank = HEADLINE_FEATURES.indexOf(f.name);
    if (rank >= 0 && rank < count) named.push({ x, y, text: f.name, cls: 'chart-label feature-label', rank });
  }
  named.sort((a, b) => a.rank - b.rank);
  placeLabels(g, named, { x0: 0, y0: top + 24, x1: S, y1: top + height }, obstacles, [C.x, C.y]);
}
