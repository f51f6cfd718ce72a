/**
 * Fixtures for the compare, predict and field-card API tests: an invented bow
 * whose arrows follow a virtual-mass bow exactly (E = 190 J, m_v = 300 gr;
 * invented values), two builds of different weights and sight-ins drawn from
 * the math core's own flight model, so predictions have a known answer.
 */
import { CSRF } from '../helpers/api';
import { grainsToKg, mpsToFps } from '@/math';
import { bowBody, buildBody, knownMarks, knownSight, type Agent } from './bow-fixtures';

/** The invented bow's virtual-mass model: every arrow of mass m leaves at √(2E/(m + m_v)). */
export const BOW_ENERGY_J = 190;
export const BOW_VIRTUAL_MASS_GR = 300;
export const trueSpeedFps = (massGr: number) => mpsToFps(Math.sqrt((2 * BOW_ENERGY_J) / grainsToKg(massGr + BOW_VIRTUAL_MASS_GR)));

/** A lighter build than buildBody's (≈ 375 gr against ≈ 501 gr), 6.0 mm shaft. */
export const lightBuildFields = {
  name: 'Test light',
  grainsPerInch: 8.2,
  pointGr: 100,
  insertGr: 16,
  vaneWeightGr: 6,
  wrapGr: 0,
  diameterMm: 6.0,
};

type Made = { id: number; name: string; derived: { totalGr: number }; diameterMm: number };

/** Posts a build; `chronographed` gives it the invented bow's true speed for its mass. */
export async function addBuild(agent: Agent, bowId: number, fields: Record<string, unknown>, chronographed = true): Promise<Made> {
  const first = await agent.post(`/api/bows/${bowId}/builds`).set(CSRF).send(buildBody(fields));
  if (first.status !== 201) throw new Error(`build: ${first.status} ${JSON.stringify(first.body)}`);
  if (!chronographed) return first.body.build;
  const speedFps = trueSpeedFps(first.body.build.derived.totalGr);
  const res = await agent.patch(`/api/builds/${first.body.build.id}`).set(CSRF).send({ speedFps });
  if (res.status !== 200) throw new Error(`build speed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.build;
}

/** The sight the marks of `build` come from: knownSight's geometry carrying that arrow at its true speed. */
export function sightFor(build: Made, air: { altitudeM?: number; temperatureC?: number } = {}) {
  return {
    ...knownSight,
    arrowMassGr: build.derived.totalGr,
    arrowDiameterMm: build.diameterMm,
    speedFps: trueSpeedFps(build.derived.totalGr),
    ...air,
  };
}

/** Posts a sight-in of `build` with marks at `distances` drawn from sightFor(build). */
export async function addSightIn(
  agent: Agent,
  bowId: number,
  build: Made,
  options: { distances?: number[]; date?: string; altitudeM?: number; temperatureC?: number } = {},
) {
  const distances = options.distances ?? [20, 40, 60];
  const air: { altitudeM?: number; temperatureC?: number } = {};
  if (options.altitudeM !== undefined) air.altitudeM = options.altitudeM;
  if (options.temperatureC !== undefined) air.temperatureC = options.temperatureC;
  const res = await agent
    .post(`/api/bows/${bowId}/sight-ins`)
    .set(CSRF)
    .send({
      buildId: build.id,
      date: options.date ?? '2026-11-02',
      placeLabel: 'Test range',
      altitudeM: options.altitudeM ?? null,
      temperatureC: options.temperatureC ?? null,
      marks: knownMarks(distances, sightFor(build, air)),
    });
  if (res.status !== 201) throw new Error(`sight-in: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.sightIn;
}

/** A bow with a heavy and a light build (both chronographed unless told), each with a sight-in unless `sight-ins` is false. */
export async function bowWithTwoBuilds(agent: Agent, { chronographed = true, sightIns = true, bow = {} as Record<string, unknown> } = {}) {
  const bowRes = await agent.post('/api/bows').set(CSRF).send(bowBody(bow));
  if (bowRes.status !== 201) throw new Error(`bow: ${bowRes.status} ${JSON.stringify(bowRes.body)}`);
  const bowId: number = bowRes.body.bow.id;
  const heavy = await addBuild(agent, bowId, {}, chronographed);
  const light = await addBuild(agent, bowId, lightBuildFields, chronographed);
  const heavySightIn = sightIns ? await addSightIn(agent, bowId, heavy) : null;
  const lightSightIn = sightIns ? await addSightIn(agent, bowId, light) : null;
  return { bowId, heavy, light, heavySightIn, lightSightIn };
}
