// The three drawings, as plain SVG.
const NS = 'http://www.w3.org/2000/svg';

function el(name, attrs = {}, text) {
  const node = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, v);
  if (text !== undefined) node.textContent = text;
  return node;
}

function clear(svg, title) {
  while (svg.firstChild) svg.removeChild(svg.firstChild);
  svg.appendChild(el('title', {}, title));
}

const SKY = [
  [-0.83, '#4a5d93', 'day'], [-6, '#2e3c6c', 'civil twilight'], [-12, '#1d2750', 'nautical twilight'],
  [-18, '#131a3a', 'astronomical twilight'], [-90, '#080c1f', 'night'],
];
const skyColour = (sun) => SKY.find(([limit]) => sun > limit)?.[1] ?? SKY[SKY.length - 1][1];
const PHASE = { penumbral: '#7c88b8', partial: '#e0894a', total: '#b8442b' };

/** Moon altitude through the night, sky shading, phases and horizon profile. */
export function drawTimeline(svg, local, eclipse) {
  clear(svg, 'The Moon\'s altitude through the night');
  const track = local.track;
  const [W, H, left, right, top, bottom] = [720, 280, 44, 10, 34, 26];
  const t0 = Date.parse(track[0].utc), t1 = Date.parse(track[track.length - 1].utc);
  const x = (utc) => left + (Date.parse(utc) - t0) / (t1 - t0) * (W - left - right);
  const y = (alt) => top + (90 - Math.max(-20, Math.min(90, alt))) / 110 * (H - top - bottom);
  for (let i = 1; i < track.length; i++) {
    svg.appendChild(el('rect', { x: x(track[i - 1].utc), y: top, width: Math.max(0.5, x(track[i].utc) - x(track[i - 1].utc) + 0.5), height: H - top - bottom, fill: skyColour(track[i].sunAltitudeDegrees) }));
  }
  for (const alt of [0, 30, 60, 90]) {
    svg.appendChild(el('line', { x1: left, x2: W - right, y1: y(alt), y2: y(alt), stroke: alt === 0 ? '#9aa6c8' : '#2a3560', 'stroke-width': alt === 0 ? 1.2 : 0.6 }));
    svg.appendChild(el('text', { x: left - 6, y: y(alt) + 4, 'text-anchor': 'end' }, `${alt}°`));
  }
  const dashes = track.map((p) => `${x(p.utc)},${y(p.horizonAltitudeDegrees)}`).join(' ');
  svg.appendChild(el('polyline', { points: dashes, fill: 'none', stroke: '#9fb4c8', 'stroke-dasharray': '5 4', 'stroke-width': 1.2, class: 'horizon-profile' }));
  svg.appendChild(el('polyline', { points: track.map((p) => `${x(p.utc)},${y(p.moonAltitudeDegrees)}`).join(' '), fill: 'none', stroke: '#f5ecd4', 'stroke-width': 2.2, class: 'moon-altitude' }));
  // Phase bars along the top: the whole phase faint, the visible part solid.
  const c = Object.fromEntries(eclipse.contacts.map((k) => [k.name, k.utc]));
  const bars = [['penumbral', 'P1', 'P4', 4], ['partial', 'U1', 'U4', 13], ['total', 'U2', 'U3', 22]];
  for (const [phase, a, b, row] of bars) {
    if (!c[a] || !c[b]) continue;
    svg.appendChild(el('rect', { x: x(c[a]), y: row, width: x(c[b]) - x(c[a]), height: 7, fill: PHASE[phase], opacity: 0.3 }));
    for (const v of local.visiblePhases.filter((p) => p.phase === phase)) {
      svg.appendChild(el('rect', { x: x(v.startUtc), y: row, width: Math.max(1, x(v.endUtc) - x(v.startUtc)), height: 7, fill: PHASE[phase], class: `visible-${phase}` }));
    }
  }
  for (const k of local.contacts) {
    const px = x(k.utc);
    svg.appendChild(el('line', { x1: px, x2: px, y1: top, y2: H - bottom, stroke: '#e0894a', 'stroke-width': 0.8, 'stroke-dasharray': '2 3', class: 'contact-mark' }));
    svg.appendChild(el('text', { x: px + 2, y: H - bottom + 12 }, k.name === 'greatest' ? 'max' : k.name));
  }
}

/** The Moon's path through the penumbra and umbra. */
export function drawShadow(svg, eclipse) {
  clear(svg, 'The Moon\'s path through the Earth\'s shadow');
  const d = eclipse.shadowDiagram;
  const scale = 180 / (d.penumbraRadiusDegrees + 2 * d.moonRadiusDegrees);
  svg.appendChild(el('circle', { cx: 0, cy: 0, r: d.penumbraRadiusDegrees * scale, fill: '#27305a', class: 'penumbra' }));
  svg.appendChild(el('circle', { cx: 0, cy: 0, r: d.umbraRadiusDegrees * scale, fill: '#4a1d17', class: 'umbra' }));
  // East is to the left on the sky as seen from the northern hemisphere facing south.
  const px = (p) => -p.eastDegrees * scale, py = (p) => -p.northDegrees * scale;
  svg.appendChild(el('polyline', { points: d.points.map((p) => `${px(p)},${py(p)}`).join(' '), fill: 'none', stroke: '#9aa6c8', 'stroke-width': 1 }));
  for (const p of d.points) {
    svg.appendChild(el('circle', { cx: px(p), cy: py(p), r: d.moonRadiusDegrees * scale, fill: p.name === 'greatest' ? 'rgba(224,137,74,0.35)' : 'none', stroke: '#f5ecd4', 'stroke-width': 1, class: 'moon-disc' }));
    svg.appendChild(el('text', { x: px(p), y: py(p) + 4, 'text-anchor': 'middle' }, p.name === 'greatest' ? 'max' : p.name));
  }
  svg.appendChild(el('text', { x: 0, y: -188, 'text-anchor': 'middle' }, 'N'));
  svg.appendChild(el('text', { x: -192, y: 4, 'text-anchor': 'middle' }, 'E'));
  svg.appendChild(el('text', { x: 0, y: 196, 'text-anchor': 'middle' }, eclipse.shadowModel + ' shadow'));
}

/** World land, the regions of visibility, and the site. */
export function drawMap(svg, land, map, site) {
  clear(svg, 'Where on Earth the eclipse can be seen');
  const x = (lon) => (lon + 180) * 2, y = (lat) => (90 - lat) * 2;
  const ring = (r) => r.map(([lon, lat]) => `${x(lon).toFixed(1)},${y(lat).toFixed(1)}`).join(' ');
  for (const f of land.features) {
    const polygons = f.geometry.type === 'Polygon' ? [f.geometry.coordinates] : f.geometry.coordinates;
    for (const p of polygons) svg.appendChild(el('polygon', { points: ring(p[0]), fill: '#2b3762', stroke: '#46558a', 'stroke-width': 0.4, class: 'land' }));
  }
  const fills = { 'whole-eclipse': 'rgba(224,137,74,0.45)', 'whole-totality': 'rgba(184,68,43,0.55)' };
  for (const f of map.features.filter((f) => fills[f.properties.name])) {
    const g = el('g', { class: `region-${f.properties.name}`, 'shape-rendering': 'crispEdges' });
    for (const p of f.geometry.coordinates) g.appendChild(el('polygon', { points: ring(p[0]), fill: fills[f.properties.name] }));
    svg.appendChild(g);
  }
  svg.appendChild(el('circle', { cx: x(site.lon), cy: y(site.lat), r: 6, fill: 'none', stroke: '#ffd27a', 'stroke-width': 2.5, class: 'site' }));
}
