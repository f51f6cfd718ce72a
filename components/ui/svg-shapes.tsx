/**
 * The few SVG shapes the app's small drawings use (icons, the mark, the home picture).
 * On native they are react-native-svg's; the web build takes svg-shapes.web.tsx instead,
 * which draws the same shapes as plain DOM elements so that the first screen does not
 * carry react-native-svg. Charts and diagrams keep using react-native-svg directly.
 */
export { default as Svg, Circle, Line, Path, Rect } from 'react-native-svg';
