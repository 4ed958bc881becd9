/**
 * The layers of the trade scatter, one function each, so the component's draw() only lays them out:
 * marks (canvas for thousands, SVG otherwise), the Pareto front, the selection rings and the key.
 */
import * as d3 from 'd3';
import { CHART_FONT } from './chart-layout';

export interface ScatterMark { x: number; y: number; pass: boolean | null }
type Scale = d3.ScaleLinear<number, number>;
type Group = d3.Selection<SVGGElement, unknown, null, undefined>;

const FRONT_COLOUR = '#b3472f';
const SELECTED_COLOUR = '#f2b441';
const MARK_COLOUR = '#1d7a74';

/** Marks on a canvas under the SVG (axes, front and selection stay vector); failing designs as rings. */
export function paintMarks<M extends ScatterMark>(canvas: HTMLCanvasElement, marks: M[], x: Scale, y: Scale, origin: { left: number; top: number }, size: { width: number; height: number }, fill: (m: M) => string): void {
  const ratio = window.devicePixelRatio || 1;
  canvas.width = size.width * ratio;
  canvas.height = size.height * ratio;
  const ctx = canvas.getContext('2d');
  if (!ctx) return;
  ctx.scale(ratio, ratio);
  ctx.clearRect(0, 0, size.width, size.height);
  for (const m of marks) {
    ctx.beginPath();
    ctx.arc(origin.left + x(m.x), origin.top + y(m.y), 2.5, 0, 2 * Math.PI);
    if (m.pass === false) {
      ctx.strokeStyle = fill(m);
      ctx.stroke();
    } else {
      ctx.fillStyle = fill(m);
      ctx.fill();
    }
  }
}

/** Marks as SVG circles; failing designs as rings. */
export function drawMarks<M extends ScatterMark>(g: Group, marks: M[], x: Scale, y: Scale, fill: (m: M) => string): void {
  g.append('g')
    .selectAll('circle')
    .data(marks)
    .join('circle')
    .attr('class', 'mark')
    .attr('cx', (m) => x(m.x))
    .attr('cy', (m) => y(m.y))
    .attr('r', 4)
    .attr('fill', (m) => (m.pass === false ? 'none' : fill(m)))
    .attr('stroke', (m) => fill(m))
    .attr('stroke-width', 1.5)
    .attr('opacity', 0.85);
}

/** The Pareto front as a dashed staircase through its marks. */
export function drawFront<M extends ScatterMark>(g: Group, front: M[], x: Scale, y: Scale): void {
  g.append('path')
    .datum(front)
    .attr('fill', 'none')
    .attr('stroke', FRONT_COLOUR)
    .attr('stroke-width', 2)
    .attr('stroke-dasharray', '6 3')
    .attr('d', d3.line<M>().x((m) => x(m.x)).y((m) => y(m.y)).curve(d3.curveStepAfter));
}

/** Rings round the selected marks. */
export function drawSelection<M extends ScatterMark>(g: Group, selected: M[], x: Scale, y: Scale): void {
  g.append('g')
    .selectAll('circle')
    .data(selected)
    .join('circle')
    .attr('class', 'selected-mark')
    .attr('cx', (m) => x(m.x))
    .attr('cy', (m) => y(m.y))
    .attr('r', 8)
    .attr('fill', 'none')
    .attr('stroke', SELECTED_COLOUR)
    .attr('stroke-width', 3);
}

/** The key above the plot: pass / fail marks (when a sheet judges them), the front and the selection. */
export function drawScatterKey(svg: d3.Selection<SVGSVGElement, unknown, null, undefined>, left: number, judged: boolean, frontSize: number): void {
  const lg = svg.append('g').attr('transform', `translate(${left},6)`).attr('font-family', CHART_FONT).attr('font-size', 11).attr('fill', '#123f45');
  lg.append('circle').attr('cx', 5).attr('cy', 14).attr('r', 4).attr('fill', MARK_COLOUR);
  lg.append('text').attr('x', 14).attr('y', 18).text(judged ? 'passes the target sheet' : 'design');
  if (judged) {
    lg.append('circle').attr('cx', 165).attr('cy', 14).attr('r', 4).attr('fill', 'none').attr('stroke', MARK_COLOUR).attr('stroke-width', 1.5);
    lg.append('text').attr('x', 174).attr('y', 18).text('fails');
  }
  lg.append('line').attr('x1', 215).attr('x2', 240).attr('y1', 14).attr('y2', 14).attr('stroke', FRONT_COLOUR).attr('stroke-width', 2).attr('stroke-dasharray', '6 3');
  lg.append('text').attr('x', 246).attr('y', 18).text(`Pareto front (${frontSize})`);
  lg.append('circle').attr('cx', 360).attr('cy', 14).attr('r', 6).attr('fill', 'none').attr('stroke', SELECTED_COLOUR).attr('stroke-width', 3);
  lg.append('text').attr('x', 372).attr('y', 18).text('selected');
}

/** A transparent hit area over the plot: the nearest mark within 12 px is hovered or clicked. */
export function attachHover<M extends ScatterMark>(g: Group, marks: M[], x: Scale, y: Scale, size: { w: number; h: number }, on: { hover: (m: M | undefined) => void; click: (m: M) => void }): void {
  const tree = d3.quadtree(marks, (m) => x(m.x), (m) => y(m.y));
  const hit = (ev: MouseEvent) => {
    const [mx, my] = d3.pointer(ev);
    return tree.find(mx, my, 12);
  };
  g.append('rect')
    .attr('width', size.w)
    .attr('height', size.h)
    .attr('fill', 'transparent')
    .style('cursor', 'crosshair')
    .on('mousemove', (ev: MouseEvent) => on.hover(hit(ev)))
    .on('mouseleave', () => on.hover(undefined))
    .on('click', (ev: MouseEvent) => {
      const m = hit(ev);
      if (m) on.click(m);
    });
}
