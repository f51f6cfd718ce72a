import { airDensityKgM3, geopotentialHeightM, standardAtmosphere } from '@/math/air';

describe('standard atmosphere', () => {
  // ISO 2533:1975 tables 5–7 (also U.S. Standard Atmosphere 1976), density at
  // geopotential height H, kg/m³, printed to 6 significant figures.
  const table: [number, number][] = [
    [0, 1.225],
    [1000, 1.11164],
    [1500, 1.05807],
    [2000, 1.00649],
    [3000, 0.909122],
    [4000, 0.819129],
  ];
  it.each(table)('at H = %d m gives the ISO 2533 density %f kg/m³', (height, density) => {
    // Within half a unit of the table's last printed digit (6 significant figures).
    expect(Math.abs(standardAtmosphere(height).densityKgM3 - density)).toBeLessThan(density * 5e-6);
  });

  it('has the ISO 2533 sea-level temperature and pressure', () => {
    const air = standardAtmosphere(0);
    expect(air.temperatureK).toBeCloseTo(288.15, 10);
    expect(air.pressurePa).toBeCloseTo(101325, 6);
  });

  it('turns geometric into geopotential height (US Std Atm 1976, r0 = 6356766 m)', () => {
    expect(geopotentialHeightM(0)).toBe(0);
    expect(geopotentialHeightM(4000)).toBeCloseTo((6356766 * 4000) / (6356766 + 4000), 9);
    expect(4000 - geopotentialHeightM(4000)).toBeGreaterThan(2.4);
    expect(4000 - geopotentialHeightM(4000)).toBeLessThan(2.6);
  });

  it('uses a measured temperature with the standard pressure (ideal gas)', () => {
    const standard = standardAtmosphere(geopotentialHeightM(1200));
    const warm = airDensityKgM3({ altitudeM: 1200, temperatureC: 30 });
    expect(warm).toBeCloseTo(standard.pressurePa / (287.053 * 303.15), 12);
    expect(airDensityKgM3({ altitudeM: 1200 })).toBeCloseTo(standard.densityKgM3, 12);
    // Warmer air is thinner; higher air is thinner.
    expect(airDensityKgM3({ altitudeM: 0, temperatureC: 35 })).toBeLessThan(airDensityKgM3({ altitudeM: 0, temperatureC: 0 }));
    expect(airDensityKgM3({ altitudeM: 2500 })).toBeLessThan(airDensityKgM3({ altitudeM: 500 }));
    expect(airDensityKgM3()).toBeCloseTo(1.225, 4);
  });

  it('refuses heights outside the troposphere model and unphysical temperatures', () => {
    expect(() => standardAtmosphere(12000)).toThrow(RangeError);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(RangeError);
    expect(() => airDensityKgM3({ temperatureC: -300 })).toThrow(RangeError);
  });
});
