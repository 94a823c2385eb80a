// Small SVG helpers shared by the charts: element creation, text measuring and label placement without overlaps.
export const NS = 'http://www.w3.org/2000/svg';

export function el(name, attrs = {}, text) {
  const node = document.createElementNS(NS, name);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, v);
  if (text !== undefined) node.textContent = text;
  return node;
}

/** Empties an SVG, sizes its viewBox to its on-screen width (so 1 unit is 1 CSS pixel) and titles it. */
export function reset(svg, title, width, height) {
  while (svg.firstChild) svg.removeChild(svg.firstChild);
  svg.setAttribute('viewBox', `0 0 ${width} ${height}`);
  svg.setAttribute('width', width);
  svg.setAttribute('height', height);
  svg.appendChild(el('title', {}, title));
}

/** The width an SVG should be drawn at: its container's width in CSS pixels. */
export function widthOf(svg, fallback = 720) {
  const w = svg.parentElement?.clientWidth ?? 0;
  return Math.max(280, Math.round(w || fallback));
}

const FONT = 12;
/** Width of a text in the chart font, measured with a canvas (falls back to an estimate). */
let canvas;
export function textWidth(text, size = FONT, weight = 400) {
  canvas ??= document.createElement('canvas');
  const ctx = canvas.getContext('2d');
  if (!ctx) return text.length * size * 0.62;
  ctx.font = `${weight} ${size}px ${getComputedStyle(document.body).fontFamily}`;
  return Math.ceil(ctx.measureText(text).width) + 2;
}

/** A text label's box around (x, y) for the given anchor; y is the baseline. */
export function box(x, y, w, anchor = 'middle', size = FONT) {
  const x0 = anchor === 'middle' ? x - w / 2 : anchor === 'end' ? x - w : x;
  return { x0: x0 - 2, x1: x0 + w + 2, y0: y - size * 0.95, y1: y + size * 0.3 };
}

export const intersects = (a, b) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * Stacks labels anchored at x positions into as few rows as needed so that none overlap, each kept inside [min, max].
 * Returns for each label { x, row } (x is the label's centre) and the number of rows used.
 */
export function stackInRows(items, min, max, gap = 6) {
  const order = items.map((item, i) => ({ ...item, i })).sort((a, b) => a.x - b.x);
  const rowsEnd = [];
  const placed = [];
  for (const item of order) {
    const half = item.width / 2;
    const x = Math.min(Math.max(item.x, min + half), max - half);
    let row = rowsEnd.findIndex((end) => x - half >= end + gap);
    if (row < 0) { row = rowsEnd.length; rowsEnd.push(-Infinity); }
    rowsEnd[row] = x + half;
    placed[item.i] = { x, row };
  }
  return { placed, rows: Math.max(1, rowsEnd.length) };
}

/**
 * Places each label at the first candidate position whose box is inside the frame and clear of every earlier label
 * and obstacle. Candidates are [dx, dy] offsets from the label's anchor; the last resort widens the search outward.
 */
export function placeFree(labels, frame, obstacles = []) {
  const taken = [...obstacles];
  return labels.map((label) => {
    const tries = [...label.candidates];
    for (let k = 2; k <= 8; k++) for (const [dx, dy] of label.candidates) tries.push([dx * k, dy * k]);
    for (let dy = -frame.y1; dy <= frame.y1 * 2; dy += 7) tries.push([0, dy]);
    for (const [dx, dy] of tries) {
      const x = label.x + dx, y = label.y + dy;
      const b = box(x, y, label.width, 'middle');
      if (b.x0 < frame.x0 || b.x1 > frame.x1 || b.y0 < frame.y0 || b.y1 > frame.y1) continue;
      if (taken.some((t) => intersects(t, b))) continue;
      taken.push(b);
      return { x, y, moved: Math.hypot(dx, dy) };
    }
    return { x: label.x, y: label.y, moved: 0 };
  });
}

/**
 * Spreads labels along one row: each wants to be centred on its x; overlapping neighbours are pushed apart as a group
 * centred on their mean, and the row is kept inside [min, max]. Returns each label's centre, or null if they cannot fit.
 */
export function spreadInRow(items, min, max, gap = 8) {
  const order = items.map((item, i) => ({ ...item, i })).sort((a, b) => a.x - b.x);
  const total = order.reduce((s, item) => s + item.width + gap, -gap);
  if (total > max - min) return null;
  let blocks = order.map((item) => ({ members: [item], width: item.width, want: item.x }));
  const startOf = (b) => Math.min(Math.max(b.want - b.width / 2, min), max - b.width);
  for (let merged = true; merged;) {
    merged = false;
    for (let k = 0; k + 1 < blocks.length; k++) {
      if (startOf(blocks[k]) + blocks[k].width + gap > startOf(blocks[k + 1])) {
        const a = blocks[k], b = blocks[k + 1];
        const members = [...a.members, ...b.members];
        const width = a.width + gap + b.width;
        // Centre the group so that its members sit, on average, where they want to be.
        let offset = 0, acc = 0;
        for (const m of members) { acc += m.x - (offset + m.width / 2); offset += m.width + gap; }
        blocks.splice(k, 2, { members, width, want: acc / members.length + width / 2 });
        merged = true;
        break;
      }
    }
  }
  const centres = [];
  for (const b of blocks) {
    let at = startOf(b);
    for (const m of b.members) { centres[m.i] = at + m.width / 2; at += m.width + gap; }
  }
  return centres;
}
