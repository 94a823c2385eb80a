namespace LunarShadow.Browser.Tests;

/// <summary>Measurements run inside the page.</summary>
internal static class PageScripts
{
    /// <summary>Pairs of chart labels whose boxes intersect, and labels outside their chart, in an SVG (by selector).</summary>
    public const string OverlappingLabels = """
        (selector) => {
          const svg = document.querySelector(selector);
          if (!svg) return ['no chart ' + selector];
          const frame = svg.getBoundingClientRect();
          const boxes = [...svg.querySelectorAll('text')].map((t) => ({ text: t.textContent, r: t.getBoundingClientRect() })).filter((b) => b.r.width > 0);
          const problems = [];
          for (let i = 0; i < boxes.length; i++) {
            const a = boxes[i].r;
            if (a.left < frame.left - 0.5 || a.right > frame.right + 0.5 || a.top < frame.top - 0.5 || a.bottom > frame.bottom + 0.5) problems.push(`'${boxes[i].text}' outside the chart`);
            for (let j = i + 1; j < boxes.length; j++) {
              const b = boxes[j].r;
              const overlap = Math.min(a.right, b.right) - Math.max(a.left, b.left) > 0.5 && Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top) > 0.5;
              if (overlap) problems.push(`'${boxes[i].text}' overlaps '${boxes[j].text}'`);
            }
          }
          return problems;
        }
        """;

    /// <summary>Visible texts whose effective size is under a limit (CSS px, SVG text scaled by its chart).</summary>
    public const string SmallTexts = """
        (limit) => {
          const small = [];
          const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
          for (let n = walker.nextNode(); n; n = walker.nextNode()) {
            if (!n.textContent.trim()) continue;
            const el = n.parentElement;
            if (!el || el.closest('[hidden], title, script, style, .visually-hidden, option')) continue;
            const r = el.getBoundingClientRect();
            if (r.width === 0 || r.height === 0) continue;
            let size = parseFloat(getComputedStyle(el).fontSize);
            if (el instanceof SVGElement) size *= el.ownerSVGElement?.getScreenCTM()?.a ?? 1;
            if (size < limit) small.push(`${el.tagName} '${n.textContent.trim().slice(0, 30)}' ${size.toFixed(1)}px`);
          }
          return small;
        }
        """;

    /// <summary>Texts whose contrast with the background behind them is under a ratio (WCAG 2.1 relative luminance).</summary>
    public const string LowContrast = """
        (ratio) => {
          const rgb = (c) => (c.match(/[\d.]+/g) || []).map(Number);
          const lum = ([r, g, b]) => {
            const f = (v) => { v /= 255; return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4); };
            return 0.2126 * f(r) + 0.7152 * f(g) + 0.0722 * f(b);
          };
          const background = (el) => {
            for (let e = el; e; e = e.parentElement) {
              const c = rgb(getComputedStyle(e).backgroundColor);
              if (c.length >= 3 && (c.length < 4 || c[3] > 0.5)) return c;
            }
            return [255, 255, 255];
          };
          const bad = [];
          const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
          for (let n = walker.nextNode(); n; n = walker.nextNode()) {
            if (!n.textContent.trim()) continue;
            const el = n.parentElement;
            if (!el || el.closest('[hidden], title, script, style, .visually-hidden')) continue;
            if (el.getBoundingClientRect().width === 0) continue;
            const style = getComputedStyle(el);
            const fg = rgb(el instanceof SVGElement ? style.fill : style.color);
            const bg = el instanceof SVGElement ? rgb(getComputedStyle(el.ownerSVGElement).backgroundColor) : background(el);
            const [a, b] = [lum(fg), lum(bg)].sort((x, y) => y - x);
            const r = (a + 0.05) / (b + 0.05);
            if (r < ratio) bad.push(`'${n.textContent.trim().slice(0, 30)}' ${r.toFixed(2)}:1`);
          }
          return bad;
        }
        """;

    /// <summary>
    /// Segments of the world map's paths that jump more than half the map across (a ring crossing ±180° drawn straight
    /// across the map); the closing edges along the poles (top and bottom rows) are allowed.
    /// </summary>
    public const string MapJumps = """
        () => {
          const svg = document.querySelector('#world-map');
          const W = +svg.getAttribute('width'), H = +svg.getAttribute('height');
          const bad = [];
          for (const p of svg.querySelectorAll('path')) {
            for (const sub of (p.getAttribute('d') || '').split('M').filter(Boolean)) {
              const pts = sub.replace(/Z/g, '').split('L').map((t) => t.split(',').map(Number));
              for (let i = 1; i < pts.length; i++) {
                const [x0, y0] = pts[i - 1], [x1, y1] = pts[i];
                const alongPole = (y0 <= 1 && y1 <= 1) || (y0 >= H - 1 && y1 >= H - 1);
                if (Math.abs(x1 - x0) > W / 2 && !alongPole) bad.push(`${p.getAttribute('class')}: ${x0},${y0} to ${x1},${y1}`);
              }
            }
          }
          return bad;
        }
        """;
}
