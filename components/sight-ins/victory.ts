// On a phone build the charts draw with victory-native (react-native-svg).
// The web build takes victory.web.ts instead: the same components as plain SVG (see there).
export { VictoryArea, VictoryAxis, VictoryChart, VictoryLine, VictoryScatter } from 'victory-native';
