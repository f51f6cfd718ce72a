/**
 * Fixtures for the bow, build, sight-in and tape API tests: valid bodies (an
 * invented bow and arrow) and marks drawn from the math core's own flight model
 * for a sight whose every parameter is known, so a fit of them has a known answer.
 */
import type { Express } from 'express';
import type request from 'supertest';
import { CSRF } from '../helpers/api';
import { simulatedReadings, type KnownSight } from '@/server/services/fit-service';

type Agent = ReturnType<typeof request.agent>;

export function bowBody(overrides: Record<string, unknown> = {}) {
  return {
    nickname: 'Test slider',
    hand: 'right',
    drawWeightLb: 62,
    drawLengthMm: 723.9,
    letOffPct: 85,
    ratedSpeedFps: 330,
    sightDescription: 'Single-pin slider, 5-inch bar',
    sightKind: 'single-pin-slider',
    sightRadiusMm: 838,
    peepHeightMm: 112,
    scaleDirection: 'down',
    tapeWidthMm: 12,
    notes: '',
    ...overrides,
  };
}

export function buildBody(overrides: Record<string, unknown> = {}) {
  return {
    name: 'Test heavy',
    shaftLabel: 'carbon 300, 9.3 gpi',
    spine: 300,
    grainsPerInch: 9.3,
    cutLengthMm: 717.55,
    diameterMm: 6.2,
    pointGr: 150,
    insertGr: 50,
    collarGr: 0,
    nockGr: 9,
    vaneCount: 3,
    vaneWeightGr: 7,
    wrapGr: 8,
    balancePointMm: 442,
    speedFps: null,
    dragCoefficient: null,
    ...overrides,
  };
}

/** The sight the test marks come from: 280 fps, Cd 2.0, 500 gr, 6.2 mm, at sea level. */
export const knownSight: KnownSight = {
  distanceUnit: 'yd',
  speedFps: 280,
  dragCoefficient: 2.0,
  arrowMassGr: 500,
  arrowDiameterMm: 6.2,
  peepHeightMm: 112,
  sightRadiusMm: 838,
  scaleZeroMm: 3,
};

/** Marks at `distances` (yd) from knownSight, rounded to 0.1 mm as an archer reads them. */
export function knownMarks(distances: number[], sight: KnownSight = knownSight) {
  return simulatedReadings(sight, distances).map((reading, index) => ({
    distance: distances[index],
    unit: 'yd' as const,
    scaleMm: Math.round(reading * 10) / 10,
    arrowsShot: 3,
    note: '',
  }));
}

/** A bow with one build (500 gr: matches knownSight's mass within rounding), through the API. */
export async function bowWithBuild(agent: Agent, bow: Record<string, unknown> = {}, build: Record<string, unknown> = {}) {
  const bowRes = await agent.post('/api/bows').set(CSRF).send(bowBody(bow));
  if (bowRes.status !== 201) throw new Error(`bow: ${bowRes.status} ${JSON.stringify(bowRes.body)}`);
  const buildRes = await agent.post(`/api/bows/${bowRes.body.bow.id}/builds`).set(CSRF).send(buildBody(build));
  if (buildRes.status !== 201) throw new Error(`build: ${buildRes.status} ${JSON.stringify(buildRes.body)}`);
  return { bow: bowRes.body.bow, build: buildRes.body.build };
}

/** A bow, a build and a sight-in with marks at `distances`, through the API. */
export async function bowWithSightIn(
  agent: Agent,
  distances = [20, 40, 60],
  sightIn: Record<string, unknown> = {},
  bow: Record<string, unknown> = {},
) {
  const made = await bowWithBuild(agent, bow);
  const res = await agent
    .post(`/api/bows/${made.bow.id}/sight-ins`)
    .set(CSRF)
    .send({ buildId: made.build.id, date: '2026-11-02', placeLabel: 'Test range', marks: knownMarks(distances), ...sightIn });
  if (res.status !== 201) throw new Error(`sight-in: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...made, sightIn: res.body.sightIn };
}

export type { Agent, Express };
