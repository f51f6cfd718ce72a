// On the web, victory's own packages draw plain DOM SVG: no dev-mode prop warning from
// react-native-svg on web, and they render in jsdom for tests. Same API as victory-native 37.
export { VictoryArea } from 'victory-area';
export { VictoryAxis } from 'victory-axis';
export { VictoryChart } from 'victory-chart';
export { VictoryLine } from 'victory-line';
export { VictoryScatter } from 'victory-scatter';
