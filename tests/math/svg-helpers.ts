import { DOMParser, type Document, type Element } from '@xmldom/xmldom';

/** Parse SVG text with a real XML parser (@xmldom/xmldom), failing on any XML error. */
export function parseSvg(svg: string): Document {
  const errors: string[] = [];
  const document = new DOMParser({
    onError: (level, message) => {
      if (level !== 'warning') errors.push(message);
    },
  }).parseFromString(svg, 'image/svg+xml');
  if (errors.length > 0) throw new Error(`SVG does not parse: ${errors.join('; ')}`);
  return document;
}

/** All elements named `tag` under `root`, as an array. */
export function elements(root: Document | Element, tag: string): Element[] {
  return Array.from(root.getElementsByTagName(tag) as unknown as ArrayLike<Element>);
}

/** Number of an attribute (NaN if absent). */
export function numberAttribute(element: Element, name: string): number {
  const value = element.getAttribute(name);
  return value === null ? Number.NaN : Number(value);
}

/**
 * The vertical extent (mm) of a text path's on-curve points after its
 * matrix(a 0 0 d e f) transform: a lower bound on the drawn height (TrueType
 * outlines put their extreme points on the curve).
 */
export function onCurveExtent(element: Element): { minX: number; maxX: number; minY: number; maxY: number } {
  const matrix = /matrix\(([^)]+)\)/.exec(element.getAttribute('transform') ?? '');
  const [a, , , d, e, f] = matrix
    ? matrix[1]
        .trim()
        .split(/[\s,]+/)
        .map(Number)
    : [1, 0, 0, 1, 0, 0];
  const tokens = (element.getAttribute('d') ?? '').match(/[MmLlQqCcZz]|-?\d*\.?\d+(?:e-?\d+)?/g) ?? [];
  let x = 0,
    y = 0,
    startX = 0,
    startY = 0,
    i = 0;
  const xs: number[] = [];
  const ys: number[] = [];
  while (i < tokens.length) {
    const op = tokens[i++];
    if (op === 'Z' || op === 'z') {
      x = startX;
      y = startY;
      continue;
    }
    const pairs = /[Qq]/.test(op) ? 2 : /[Cc]/.test(op) ? 3 : 1;
    const values: number[] = [];
    for (let k = 0; k < 2 * pairs; k++) values.push(Number(tokens[i++]));
    const relative = op === op.toLowerCase();
    const endX = (relative ? x : 0) + values[values.length - 2];
    const endY = (relative ? y : 0) + values[values.length - 1];
    x = endX;
    y = endY;
    if (op === 'M' || op === 'm') {
      startX = x;
      startY = y;
    }
    xs.push(a * x + e);
    ys.push(d * y + f);
  }
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}
