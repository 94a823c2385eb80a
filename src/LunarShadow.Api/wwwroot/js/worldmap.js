// The world, centred on the site's longitude so the site is always in the frame, with where the whole eclipse and the
// whole totality can be seen. Colours: Okabe & Ito (2008) colour-universal palette (sky blue; vermillion hatching),
// readable with the common colour-vision deficiencies. Rings are unwrapped across the antimeridian and drawn three
// times (shifted by ±360°) inside a clip, so nothing crossing ±180° turns into a line across the map.
import { el, reset, widthOf } from './svg.js';

export const MAP_COLOURS = { wholeEclipse: '#56B4E9', wholeTotality: '#D55E00', greatest: '#F0E442', site: '#ffffff' };

/** A ring with longitudes relative to the centre, made continuous (no jumps over 180°). */
function unwrap(ring, centre) {
  const out = [];
  let prev = null;
  for (const [lon, lat] of ring) {
    let l = lon - centre;
    if (prev === null) l = ((l + 540) % 360) - 180;
    else { while (l - prev > 180) l -= 360; while (l - prev < -180) l += 360; }
    out.push([l, lat]);
    prev = l;
  }
  // A ring that goes once around the globe (Antarctica) is closed along the nearer pole.
  const span = out[out.length - 1][0] - out[0][0];
  if (Math.abs(span) > 180) {
    const pole = out.reduce((s, p) => s + p[1], 0) / out.length < 0 ? -90 : 90;
    out.push([out[out.length - 1][0], pole], [out[0][0], pole]);
  }
  return out;
}

export function drawMap(svg, land, map, site) {
  const W = widthOf(svg);
  const H = Math.round(W / 2);
  reset(svg, 'Where on Earth the eclipse can be seen, centred on your site', W, H);
  const centre = Number(site.lon) || 0;
  const x = (l) => (l + 180) / 360 * W, y = (lat) => (90 - lat) / 180 * H;
  const path = (rings, shift) => rings.map((r) => 'M' + r.map(([l, lat]) => `${x(l + shift).toFixed(1)},${y(lat).toFixed(1)}`).join('L') + 'Z').join('');
  const defs = el('defs');
  const clip = el('clipPath', { id: 'map-frame' });
  clip.appendChild(el('rect', { x: 0, y: 0, width: W, height: H }));
  defs.appendChild(clip);
  const hatch = el('pattern', { id: 'totality-hatch', width: 7, height: 7, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' });
  hatch.appendChild(el('line', { x1: 0, y1: 0, x2: 0, y2: 7, stroke: MAP_COLOURS.wholeTotality, 'stroke-width': 3.5 }));
  defs.appendChild(hatch);
  svg.appendChild(defs);
  const g = el('g', { 'clip-path': 'url(#map-frame)' });
  svg.appendChild(g);
  g.appendChild(el('rect', { x: 0, y: 0, width: W, height: H, class: 'sea' }));

  const polygonsOf = (geometry) => (geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates);
  const draw = (polygons, attrs) => {
    for (const p of polygons) {
      const rings = p.map((r) => unwrap(r, centre));
      for (const shift of [-360, 0, 360]) g.appendChild(el('path', { d: path(rings, shift), 'fill-rule': 'evenodd', ...attrs }));
    }
  };
  for (const f of land.features) draw(polygonsOf(f.geometry), { class: 'land' });

  const region = (name) => map.features.find((f) => f.properties.name === name);
  const outline = (feature, cls) => {
    // Edges lying on ±180° only join the pieces of a region split there; they are not part of its outline.
    for (const p of polygonsOf(feature.geometry)) {
      for (const ring of p) {
        const rel = unwrap(ring, centre);
        for (const shift of [-360, 0, 360]) {
          let d = '';
          for (let i = 1; i < ring.length; i++) {
            const seam = Math.abs(ring[i][0]) === 180 && ring[i][0] === ring[i - 1][0];
            const pole = Math.abs(ring[i][1]) === 90 && ring[i][1] === ring[i - 1][1];
            if (seam || pole) continue;
            d += `M${x(rel[i - 1][0] + shift).toFixed(1)},${y(rel[i - 1][1]).toFixed(1)}L${x(rel[i][0] + shift).toFixed(1)},${y(rel[i][1]).toFixed(1)}`;
          }
          if (d) g.appendChild(el('path', { d, fill: 'none', class: cls }));
        }
      }
    }
  };
  const eclipseRegion = region('whole-eclipse');
  if (eclipseRegion) {
    const gg = el('g', { class: 'region-whole-eclipse' });
    g.appendChild(gg);
    const before = g.childNodes.length;
    draw(polygonsOf(eclipseRegion.geometry), { fill: MAP_COLOURS.wholeEclipse, opacity: 0.55, class: 'region-fill' });
    while (g.childNodes.length > before) gg.appendChild(g.childNodes[before]);
  }
  const totality = region('whole-totality');
  if (totality) {
    const gg = el('g', { class: 'region-whole-totality' });
    g.appendChild(gg);
    const before = g.childNodes.length;
    draw(polygonsOf(totality.geometry), { fill: 'url(#totality-hatch)', class: 'region-fill' });
    while (g.childNodes.length > before) gg.appendChild(g.childNodes[before]);
    outline(totality, 'outline-totality');
  }
  if (eclipseRegion) outline(eclipseRegion, 'outline-eclipse');
  const greatest = region('greatest');
  if (greatest) outline(greatest, 'outline-greatest');
  // The site: always at the centre column; kept inside the frame near the poles.
  const r = 7;
  const sy = Math.min(Math.max(y(Number(site.lat)), r + 2), H - r - 2);
  svg.appendChild(el('circle', { cx: W / 2, cy: sy, r: r + 2, class: 'site-halo' }));
  svg.appendChild(el('circle', { cx: W / 2, cy: sy, r, class: 'site' }));
}
