/**
 * Parses one sweep point's design. A table element carries thousands of pattern values that are the same object
 * for every point of the grid: it is checked once per object and shared by the parsed designs, so the schema does
 * not re-read the grid at every point and the engine's per-pattern caches (keyed by object) stay warm.
 */
import { DesignSchema, ElementSchema, type Design, type Element } from '../schemas/design.ts';

const elements = new WeakMap<object, ReturnType<typeof ElementSchema.safeParse>>();

export function parsePointDesign(input: Record<string, unknown>): ReturnType<typeof DesignSchema.safeParse> {
  const e = input.element;
  if (e === null || typeof e !== 'object' || (e as { kind?: unknown }).kind !== 'table') return DesignSchema.safeParse(input);
  let el = elements.get(e);
  if (!el) {
    el = ElementSchema.safeParse(e);
    elements.set(e, el);
  }
  // A bad element is reported by the full parse, which names the field as usual.
  if (!el.success) return DesignSchema.safeParse(input);
  // No rule of the design schema reads the element, so a stand-in is checked in its place and the parsed element put back.
  const rest = DesignSchema.safeParse({ ...input, element: { kind: 'isotropic' } });
  if (!rest.success) return rest;
  return { ...rest, data: { ...rest.data, element: el.data as Element } as Design };
}
