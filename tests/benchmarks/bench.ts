/**
 * npm run bench: medians of the trajectory core's hot paths, warm, in this
 * process. The goal is a full refit plus tape for 12 marks within one display
 * frame (16 ms), so the web app can refit on every keystroke.
 *
 * Marks are made by an invented bow's model (R 820 mm, h 110 mm, 420 gr,
 * 6.5 mm, 290 fps, Cd 2.3) with a little seeded noise.
 */
import { fitSight, printSheetSvg, predictMarksMm, tapeSvg, type FitInput, type SightModel } from '@/math';
import { sheetPdf } from '@/server/print/sheet-pdf';
import { apiReadSection } from './api-read';
import { runWebBench } from './web';

const truth: SightModel = {
  distanceUnit: 'yd',
  speedFps: 290,
  dragCoefficient: 2.3,
  airDensityKgM3: 1.225,
  arrowMassGr: 420,
  arrowDiameterMm: 6.5,
  peepHeightMm: 113,
  sightRadiusMm: 820,
  scaleZeroMm: 2,
  gravityMps2: 9.80665,
};
let seed = 12345;
const noise = () => {
  seed = (seed * 1103515245 + 12345) % 2147483648; // a linear congruential generator: repeatable noise
  return (seed / 2147483648 - 0.5) * 0.2;
};
const inputFor = (distances: number[]): FitInput => {
  const marks = predictMarksMm(truth, distances);
  return {
    distanceUnit: 'yd',
    sight: { radiusMm: 820, peepHeightMm: 110 },
    arrow: { massGr: 420, diameterMm: 6.5 },
    air: { altitudeM: 0 },
    marks: distances.map((distance, i) => ({ distance, markMm: marks[i] + noise() })),
    predict: [10, 20, 30, 40, 50, 60, 70, 80, 90, 100],
  };
};

const two = inputFor([20, 60]);
const four = inputFor([20, 40, 60, 80]);
const twelve = inputFor([10, 15, 20, 25, 30, 35, 40, 50, 60, 70, 80, 100]);
const fitTwelve = fitSight(twelve);

function median(run: () => unknown, repeats: number): number {
  for (let i = 0; i < Math.min(20, repeats); i++) run(); // warm up the JIT
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

async function main() {
  const rows: [string, number][] = [
    ['2-mark fit (with bands, next distance)', median(() => fitSight(two), 200)],
    ['4-mark fit with bands', median(() => fitSight(four), 100)],
    ['12-mark fit with bands', median(() => fitSight(twelve), 100)],
    ['tape SVG 10–100 yd', median(() => tapeSvg(fitTwelve, { from: 10, to: 100 }), 200)],
    ['print sheet SVG (7 tapes)', median(() => printSheetSvg(fitTwelve, { paper: 'a4' }), 50)],
    ['full refit + tape, 12 marks', median(() => tapeSvg(fitSight(twelve), { from: 10, to: 100 }), 100)],
  ];
  const svg = printSheetSvg(fitTwelve, { paper: 'a4' });
  const pdfStart = performance.now();
  await sheetPdf(svg, 'a4');
  rows.push(['print sheet PDF (pdfkit, once, cold)', performance.now() - pdfStart]);

  const width = Math.max(...rows.map(([name]) => name.length));
  console.log(`median ms (Node ${process.version})`);
  for (const [name, ms] of rows) console.log(`  ${name.padEnd(width)}  ${ms.toFixed(2).padStart(8)}`);
  const frame = rows[5][1];
  console.log(`goal: full refit + tape for 12 marks under 16 ms — ${frame < 16 ? 'met' : 'NOT met'} (${frame.toFixed(2)} ms)`);

  // The API's bow reads against GET /api/me: its own server and scratch database (tests/benchmarks/api-read.ts; also runs alone).
  await apiReadSection();

  // The web app: cold first load on slow 4G, static files, Lighthouse (tests/benchmarks/web.ts; also runs alone).
  await runWebBench();
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
