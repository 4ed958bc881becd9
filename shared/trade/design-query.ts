/**
 * A typed design search ("33", "#33", "8x4 taylor 6-bit", "4 ch", "5.35 mm", "column") read into terms, pure, so the
 * server turns each into SQL and the tests check the reading on its own. A bare whole number is a design number,
 * never a figure: "33" finds design #33, not "33.2 dBm".
 */
export type DesignTerm =
  | { kind: 'designIndex'; value: number }
  | { kind: 'size'; nx: number; ny: number }
  | { kind: 'channels'; value: number }
  | { kind: 'phaseBits'; value: number | null }
  | { kind: 'pitchMm'; value: number }
  | { kind: 'frequencyGHz'; value: number }
  | { kind: 'grouping'; value: 'element' | 'column' | 'row' }
  | { kind: 'word'; value: string };

const STOP_WORDS = new Set(['design', 'designs', 'of', 'per', 'pitch', 'grouping', 'taper', 'phase', 'and', 'with']);
const GROUPINGS = new Set(['element', 'column', 'row']);

/** Units written apart from their number ("4 ch", "6 bit", "5.35 mm") join it first. */
function joinUnits(q: string): string {
  return q.replace(/(\d(?:[\d.]*\d)?)\s*(ch|chan|channels?|-?bits?|mm|ghz)\b/gi, (_, n: string, u: string) => `${n}${u.replace(/^-/, '')}`);
}

export function parseDesignQuery(q: string): DesignTerm[] {
  const terms: DesignTerm[] = [];
  for (const raw of joinUnits(q.toLowerCase()).split(/[\s,;·]+/)) {
    const t = raw.replace(/^[(]+|[)]+$/g, '');
    if (t === '' || STOP_WORDS.has(t)) continue;
    let m: RegExpExecArray | null;
    if ((m = /^(?:#|no\.?|n°)?(\d{1,9})$/.exec(t))) terms.push({ kind: 'designIndex', value: Number(m[1]) });
    else if ((m = /^(\d{1,3})\s*[x×*]\s*(\d{1,3})$/.exec(t))) terms.push({ kind: 'size', nx: Number(m[1]), ny: Number(m[2]) });
    else if ((m = /^(\d{1,5})(?:ch|chan|channels?)$/.exec(t))) terms.push({ kind: 'channels', value: Number(m[1]) });
    else if ((m = /^(\d{1,2})bits?$/.exec(t))) terms.push({ kind: 'phaseBits', value: Number(m[1]) });
    else if (t === 'ideal' || t === 'continuous') terms.push({ kind: 'phaseBits', value: null });
    else if ((m = /^(\d+(?:\.\d+)?)mm$/.exec(t))) terms.push({ kind: 'pitchMm', value: Number(m[1]) });
    else if ((m = /^(\d+(?:\.\d+)?)ghz$/.exec(t))) terms.push({ kind: 'frequencyGHz', value: Number(m[1]) });
    else if (GROUPINGS.has(t)) terms.push({ kind: 'grouping', value: t as 'element' | 'column' | 'row' });
    else terms.push({ kind: 'word', value: t });
  }
  return terms;
}
