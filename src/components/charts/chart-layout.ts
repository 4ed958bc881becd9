/** Shared sizes, colours and small d3 helpers of the charts, so every chart reads and saves alike. */
import * as d3 from 'd3';

/** One line of a chart against angle. */
export interface AngleSeries {
  label: string;
  points: { x: number; y: number }[];
}

export const MARGIN = { top: 16, right: 24, bottom: 46, left: 62 };
export const CHART_FONT = "'Work Sans', system-ui, sans-serif";
/** Above this many marks a chart draws on a canvas instead of SVG elements. */
export const CANVAS_THRESHOLD = 3000;
/** Qualitative series colours (our palette first). */
export const SERIES_COLOURS = ['#1d7a74', '#f2b441', '#b3472f', '#5b6fd6', '#123f45', '#8e5bb5', '#5fb3a9', '#7a6a3a'];

/** Bottom and left axes with titles, drawn into `g`, styled by attributes so a saved SVG keeps its look. */
export function drawAxes(
  g: d3.Selection<SVGGElement, unknown, null, undefined>,
  x: d3.AxisScale<d3.NumberValue> | d3.AxisScale<string>,
  y: d3.AxisScale<d3.NumberValue> | d3.AxisScale<string>,
  width: number,
  height: number,
  xTitle: string,
  yTitle: string,
): void {
  g.append('g')
    .attr('transform', `translate(0,${height})`)
    .call(d3.axisBottom(x as d3.AxisScale<d3.NumberValue>).ticks(8) as never)
    .attr('font-family', CHART_FONT);
  g.append('g')
    .call(d3.axisLeft(y as d3.AxisScale<d3.NumberValue>).ticks(6) as never)
    .attr('font-family', CHART_FONT);
  g.append('text')
    .attr('x', width / 2)
    .attr('y', height + 38)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', '#123f45')
    .text(xTitle);
  g.append('text')
    .attr('transform', `translate(-46,${height / 2}) rotate(-90)`)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', '#123f45')
    .text(yTitle);
}

/** Light grid lines behind the data. */
export function drawGrid(
  g: d3.Selection<SVGGElement, unknown, null, undefined>,
  x: d3.ScaleLinear<number, number>,
  y: d3.ScaleLinear<number, number>,
  width: number,
  height: number,
): void {
  const grid = g.append('g').attr('stroke', '#ece9e2').attr('stroke-width', 1);
  for (const t of x.ticks(8)) grid.append('line').attr('x1', x(t)).attr('x2', x(t)).attr('y1', 0).attr('y2', height);
  for (const t of y.ticks(6)) grid.append('line').attr('x1', 0).attr('x2', width).attr('y1', y(t)).attr('y2', y(t));
}

/** A horizontal colour bar with its scale, for sequential colourings. */
export function drawColourLegend(
  svg: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  colour: d3.ScaleSequential<string>,
  x: number,
  y: number,
  width: number,
  title: string,
): void {
  const id = `grad-${Math.random().toString(36).slice(2, 9)}`;
  const [lo, hi] = colour.domain() as [number, number];
  const grad = svg.append('defs').append('linearGradient').attr('id', id);
  for (let i = 0; i <= 10; i++) {
    grad.append('stop').attr('offset', `${i * 10}%`).attr('stop-color', colour(lo + ((hi - lo) * i) / 10));
  }
  const g = svg.append('g').attr('transform', `translate(${x},${y})`).attr('font-family', CHART_FONT);
  g.append('text').attr('y', -4).attr('font-size', 11).attr('fill', '#123f45').text(title);
  g.append('rect').attr('width', width).attr('height', 10).attr('fill', `url(#${id})`);
  const s = d3.scaleLinear().domain([lo, hi]).range([0, width]);
  g.append('g').attr('transform', 'translate(0,10)').call(d3.axisBottom(s).ticks(4).tickSize(4) as never).attr('font-size', 10);
}

/** Extent padded by a few percent, never zero-width. */
export function paddedExtent(values: number[], pad = 0.05): [number, number] {
  const [lo, hi] = d3.extent(values) as [number | undefined, number | undefined];
  if (lo === undefined || hi === undefined) return [0, 1];
  if (lo === hi) return [lo - 1, hi + 1];
  const d = (hi - lo) * pad;
  return [lo - d, hi + d];
}
