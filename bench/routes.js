// The plain routes chartwright is measured against. Benchmark-only: jsdom, d3-selection and
// d3-axis are dev dependencies and never load in chartwright itself.
import { scaleBand, scaleLinear } from 'd3-scale';

/** The floor: the same bars, ticks and labels as a hand-written string template with d3-scale alone. */
export function stringTemplateChart(rows, width = 720, height = 900) {
  const m = { top: 60, right: 40, bottom: 50, left: 170 };
  const y = scaleBand().domain(rows.map((r) => r.label)).range([m.top, height - m.bottom]).padding(0.2);
  const x = scaleLinear().domain([0, Math.max(...rows.map((r) => r.value))]).nice().range([m.left, width - m.right]);
  const esc = (s) => String(s).replace(/&/g, '&amp;').replace(/</g, '&lt;');
  const parts = [`<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">`];
  for (const t of x.ticks(5)) parts.push(`<line x1="${x(t)}" x2="${x(t)}" y1="${m.top}" y2="${height - m.bottom}" stroke="#ddd"/><text x="${x(t)}" y="${height - m.bottom + 16}" text-anchor="middle">${t}</text>`);
  for (const r of rows) {
    parts.push(`<rect x="${x(0)}" y="${y(r.label)}" width="${x(r.value) - x(0)}" height="${y.bandwidth()}" fill="#206c89"/>`);
    parts.push(`<text x="${m.left - 6}" y="${y(r.label) + y.bandwidth() / 2}" text-anchor="end">${esc(r.label)}</text>`);
  }
  parts.push('</svg>');
  return parts.join('');
}

/** The route users take today: d3-selection + d3-axis building the chart in a jsdom document. */
export async function jsdomRoute() {
  const { JSDOM } = await import('jsdom');
  const { select } = await import('d3-selection');
  const { axisBottom, axisLeft } = await import('d3-axis');
  const build = (document, rows, width = 720, height = 900) => {
    const m = { top: 60, right: 40, bottom: 50, left: 170 };
    const y = scaleBand().domain(rows.map((r) => r.label)).range([m.top, height - m.bottom]).padding(0.2);
    const x = scaleLinear().domain([0, Math.max(...rows.map((r) => r.value))]).nice().range([m.left, width - m.right]);
    const body = select(document.body);
    body.selectAll('*').remove();
    const svg = body.append('svg').attr('xmlns', 'http://www.w3.org/2000/svg').attr('width', width).attr('height', height);
    svg.append('g').attr('transform', `translate(0,${height - m.bottom})`).call(axisBottom(x).ticks(5));
    svg.append('g').attr('transform', `translate(${m.left},0)`).call(axisLeft(y));
    svg.append('g').selectAll('rect').data(rows).join('rect')
      .attr('x', x(0)).attr('y', (r) => y(r.label)).attr('width', (r) => x(r.value) - x(0)).attr('height', y.bandwidth()).attr('fill', '#206c89');
    return body.html();
  };
  const shared = new JSDOM('<!doctype html><body></body>').window.document;
  return {
    sharedDocument: (rows) => build(shared, rows),
    newDocument: (rows) => build(new JSDOM('<!doctype html><body></body>').window.document, rows),
  };
}
