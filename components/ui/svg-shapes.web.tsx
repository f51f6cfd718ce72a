/**
 * Web side of svg-shapes.tsx: the shapes as plain DOM elements through react-dom, which
 * understands SVG's camel-cased attributes (strokeWidth → stroke-width). react-native-svg's
 * own web elements add its touch and transform handling on top, which these drawings never
 * use; leaving that library out takes about 12 KB (brotli) off the first screen's script.
 */
import type { ReactNode, SVGProps } from 'react';

type Shape<E extends SVGElement> = Omit<SVGProps<E>, 'ref'>;

export interface SvgProps extends Shape<SVGSVGElement> {
  children?: ReactNode;
}

export function Svg({ children, ...props }: SvgProps) {
  return (
    <svg xmlns="http://www.w3.org/2000/svg" {...props}>
      {children}
    </svg>
  );
}

export function Circle(props: Shape<SVGCircleElement>) {
  return <circle {...props} />;
}

export function Line(props: Shape<SVGLineElement>) {
  return <line {...props} />;
}

export function Path(props: Shape<SVGPathElement>) {
  return <path {...props} />;
}

export function Rect(props: Shape<SVGRectElement>) {
  return <rect {...props} />;
}
