import { describe, it, expect } from 'vitest';
import {
  MATERIALS,
  MATERIALS_TABLE_HEADER,
  describeMaterialsTable,
  findMaterial,
  materialNames,
  suggestMaterial,
  type Material,
} from '../../../src/physics/materials/index.ts';
import { integrateTable, interpolateTable, validateTable } from '../../../src/physics/properties/table.ts';

const REQUIRED = [
  'carbon-steel',
  'stainless-steel',
  'fireclay-brick',
  'insulating-firebrick',
  'dense-castable',
  'clay-flue-liner',
  'common-brick',
  'concrete',
  'mineral-wool',
  'ceramic-fibre-blanket',
  'calcium-silicate',
  'air-gap',
];
const INSULATIONS = ['insulating-firebrick', 'mineral-wool', 'ceramic-fibre-blanket', 'calcium-silicate'];

const all: Material[] = Object.values(MATERIALS);
const solids = all.filter((m) => m.kind === 'solid');
const mat = (name: string): Material => {
  const m = findMaterial(name);
  if (!m) throw new Error(`missing ${name}`);
  return m;
};

describe('material library contents', () => {
  it('holds every required material, keyed by its own kebab-case name', () => {
    for (const name of REQUIRED) expect(materialNames()).toContain(name);
    for (const [key, m] of Object.entries(MATERIALS)) {
      expect(m.name).toBe(key);
      expect(key).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(m.description.length).toBeGreaterThan(10);
      expect(m.source.length).toBeGreaterThan(10);
    }
  });

  it('has valid k(T) and cp(T) tables for every material, gaps included', () => {
    for (const m of all) {
      expect(validateTable(m.conductivity, `${m.name} conductivity`)).toEqual([]);
      expect(validateTable(m.specificHeat, `${m.name} specificHeat`)).toEqual([]);
    }
  });

  it('gives solids several table points', () => {
    for (const m of solids) {
      expect(m.conductivity.temperatureK.length, m.name).toBeGreaterThanOrEqual(3);
      expect(m.specificHeat.temperatureK.length, m.name).toBeGreaterThanOrEqual(3);
    }
  });

  it('keeps every solid within broad physical bands (common practice)', () => {
    // Bands span all construction solids, from fibre blankets to steel (common practice):
    // ρ 50–9000 kg/m³, k 0.01–100 W/m K, cp 200–1500 J/kg K, ε 0.1–1, service above 400 K,
    // E 0–300 GPa, α 0–25e-6 1/K, ν 0–0.5.
    for (const m of solids) {
      expect(m.density, m.name).toBeGreaterThan(50);
      expect(m.density, m.name).toBeLessThan(9000);
      for (const k of m.conductivity.values) {
        expect(k, m.name).toBeGreaterThan(0.01);
        expect(k, m.name).toBeLessThan(100);
      }
      for (const cp of m.specificHeat.values) {
        expect(cp, m.name).toBeGreaterThan(200);
        expect(cp, m.name).toBeLessThan(1500);
      }
      expect(m.emissivity, m.name).toBeGreaterThan(0.1);
      expect(m.emissivity, m.name).toBeLessThanOrEqual(1);
      expect(m.maxServiceTemperatureK, m.name).toBeGreaterThan(400);
      expect(m.youngsModulus, m.name).toBeGreaterThan(0);
      expect(m.youngsModulus, m.name).toBeLessThan(300e9);
      expect(m.thermalExpansion, m.name).toBeGreaterThan(0);
      expect(m.thermalExpansion, m.name).toBeLessThan(25e-6);
      expect(m.poissonRatio, m.name).toBeGreaterThanOrEqual(0);
      expect(m.poissonRatio, m.name).toBeLessThan(0.5);
    }
  });

  it('orders materials sensibly: metals ≫ dense refractories > insulations in k at 300 K', () => {
    // Common practice: metals ~15–60, dense ceramics ~1, insulations < 0.15 W/m K at room temperature.
    const k300 = (n: string) => interpolateTable(mat(n).conductivity, 300);
    expect(k300('carbon-steel')).toBeGreaterThan(k300('stainless-steel'));
    expect(k300('stainless-steel')).toBeGreaterThan(10 * k300('dense-castable'));
    for (const dense of ['fireclay-brick', 'dense-castable', 'clay-flue-liner', 'common-brick', 'concrete']) {
      expect(k300(dense), dense).toBeGreaterThan(0.5);
      for (const ins of INSULATIONS) expect(k300(dense)).toBeGreaterThan(3 * k300(ins));
    }
  });
});

describe('materials against handbook values', () => {
  it('gives plain carbon steel ρ = 7854 kg/m³, k = 60.5 W/m K, cp = 434 J/kg K at 300 K', () => {
    // Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1, plain carbon steel (from memory).
    // Tolerance 1e-9: the library holds these table points exactly.
    const m = mat('carbon-steel');
    expect(m.density).toBe(7854);
    expect(interpolateTable(m.conductivity, 300)).toBeCloseTo(60.5, 9);
    expect(interpolateTable(m.specificHeat, 300)).toBeCloseTo(434, 9);
    // Same table, 600 K: k = 48.0, cp = 559 (from memory).
    expect(interpolateTable(m.conductivity, 600)).toBeCloseTo(48.0, 9);
    expect(interpolateTable(m.specificHeat, 600)).toBeCloseTo(559, 9);
  });

  it('gives AISI 304 ρ = 7900 kg/m³, k = 14.9 W/m K, cp = 477 J/kg K at 300 K', () => {
    // Incropera & DeWitt Table A.1, AISI 304 (from memory). Exact table points.
    const m = mat('stainless-steel');
    expect(m.density).toBe(7900);
    expect(interpolateTable(m.conductivity, 300)).toBeCloseTo(14.9, 9);
    expect(interpolateTable(m.specificHeat, 300)).toBeCloseTo(477, 9);
  });

  it('gives common brick ρ = 1920, k = 0.72, cp = 835 and stone-mix concrete ρ = 2300, k = 1.4, cp = 880 at 300 K', () => {
    // Incropera & DeWitt Table A.3, "brick, common" and "concrete (stone mix)" (from memory).
    const b = mat('common-brick');
    expect(b.density).toBe(1920);
    expect(interpolateTable(b.conductivity, 300)).toBeCloseTo(0.72, 9);
    expect(interpolateTable(b.specificHeat, 300)).toBeCloseTo(835, 9);
    const c = mat('concrete');
    expect(c.density).toBe(2300);
    expect(interpolateTable(c.conductivity, 300)).toBeCloseTo(1.4, 9);
    expect(interpolateTable(c.specificHeat, 300)).toBeCloseTo(880, 9);
  });

  it('follows the EN 1992-1-2 specific heat of dry concrete from 100 to 1200 °C', () => {
    // EN 1992-1-2:2004 clause 3.3.2(1), eq. (3.9), dry concrete (u = 0 %), from memory:
    // 900 (20–100 °C), 900 + (θ − 100) (100–200 °C), 1000 + (θ − 200)/2 (200–400 °C), 1100 (400–1200 °C).
    const en = (theta: number) =>
      theta <= 100 ? 900 : theta <= 200 ? 900 + (theta - 100) : theta <= 400 ? 1000 + (theta - 200) / 2 : 1100;
    const cp = mat('concrete').specificHeat;
    // Tolerance 1e-9 J/(kg K): the standard's curve is piecewise linear and the table holds its corners.
    for (let theta = 100; theta <= 1200; theta += 12.5) {
      expect(interpolateTable(cp, theta + 273.15)).toBeCloseTo(en(theta), 9);
    }
    // The value the reviewing engineer checked: 1100 J/(kg K) at 400 °C (the old table gave 1050).
    expect(interpolateTable(cp, 673.15)).toBeCloseTo(1100, 9);
    // 20–100 °C: the handbook's 880 at 300 K meets the standard's 900 at 100 °C; within 2.3 %.
    for (let theta = 20; theta <= 100; theta += 10) {
      expect(Math.abs(interpolateTable(cp, theta + 273.15) / en(theta) - 1)).toBeLessThan(0.023);
    }
  });

  it('stores the hand-summed enthalpy rise of carbon steel from 300 to 1000 K', () => {
    // Trapezoids over Table A.1 cp points (from memory), summed by hand:
    // 100·(434+487)/2 + 200·(487+559)/2 + 200·(559+685)/2 + 200·(685+1169)/2
    // = 46 050 + 104 600 + 124 400 + 185 400 = 460 450 J/kg. Tolerance: rounding only.
    expect(integrateTable(mat('carbon-steel').specificHeat, 300, 1000)).toBeCloseTo(460450, 6);
  });

  it('names a source on every material and marks recalled numbers "from memory"', () => {
    for (const m of all) expect(m.source, m.name).toMatch(/from memory/);
  });
});

describe('insulations', () => {
  it('have conductivity rising strictly with temperature, by at least half over their range', () => {
    // Common practice: radiation through porous insulation grows ~T³, so k rises steeply with T.
    for (const name of INSULATIONS) {
      const { temperatureK, values } = mat(name).conductivity;
      for (let i = 1; i < values.length; i++) expect(values[i], `${name} @ ${temperatureK[i]} K`).toBeGreaterThan(values[i - 1]);
      expect(values[values.length - 1] / values[0], name).toBeGreaterThan(1.5);
    }
  });
});

describe('the air gap', () => {
  it('is a gap with zero density, single-point valid tables and no service limit of its own', () => {
    const g = mat('air-gap');
    expect(g.kind).toBe('gap');
    expect(g.density).toBe(0);
    expect(g.conductivity.temperatureK).toHaveLength(1);
    expect(g.specificHeat.temperatureK).toHaveLength(1);
    expect(g.maxServiceTemperatureK).toBeGreaterThanOrEqual(5000);
    expect(g.emissivity).toBeGreaterThan(0);
    expect(g.emissivity).toBeLessThanOrEqual(1);
  });

  it('is the only gap in the library', () => {
    expect(all.filter((m) => m.kind === 'gap').map((m) => m.name)).toEqual(['air-gap']);
  });
});

describe('library is read-only', () => {
  it('freezes the record, each material and its tables', () => {
    expect(Object.isFrozen(MATERIALS)).toBe(true);
    for (const m of all) {
      expect(Object.isFrozen(m)).toBe(true);
      expect(Object.isFrozen(m.conductivity.values)).toBe(true);
      expect(Object.isFrozen(m.specificHeat.temperatureK)).toBe(true);
    }
  });
});

describe('findMaterial, materialNames, suggestMaterial', () => {
  it('finds materials by exact key and forgives case, blanks and underscores', () => {
    expect(findMaterial('carbon-steel')?.name).toBe('carbon-steel');
    expect(findMaterial('  Carbon_Steel ')?.name).toBe('carbon-steel');
    expect(findMaterial('Mineral Wool')?.name).toBe('mineral-wool');
  });

  it('returns undefined for unknown names, including inherited object keys', () => {
    expect(findMaterial('unobtainium')).toBeUndefined();
    expect(findMaterial('constructor')).toBeUndefined();
    expect(findMaterial('__proto__')).toBeUndefined();
  });

  it('lists all names once', () => {
    const names = materialNames();
    expect(new Set(names).size).toBe(names.length);
    expect(names.length).toBe(all.length);
  });

  it('suggests "carbon-steel" for "carbon-steal" and the right names for other typos', () => {
    expect(suggestMaterial('carbon-steal')).toBe('carbon-steel');
    expect(suggestMaterial('ceramic-fiber-blanket')).toBe('ceramic-fibre-blanket');
    expect(suggestMaterial('fireclay brik')).toBe('fireclay-brick');
    expect(suggestMaterial('calcium-silicat')).toBe('calcium-silicate');
    expect(suggestMaterial('concret')).toBe('concrete');
  });

  it('suggests a name that contains a short fragment', () => {
    expect(suggestMaterial('castable')).toBe('dense-castable');
  });

  it('suggests nothing for unrelated names or empty input', () => {
    expect(suggestMaterial('polyethylene-terephthalate')).toBeUndefined();
    expect(suggestMaterial('xq')).toBeUndefined();
    expect(suggestMaterial('')).toBeUndefined();
  });
});

describe('describeMaterialsTable', () => {
  it('returns the header and one full row per material', () => {
    const rows = describeMaterialsTable();
    expect(rows[0]).toEqual([...MATERIALS_TABLE_HEADER]);
    expect(rows).toHaveLength(all.length + 1);
    for (const r of rows) expect(r).toHaveLength(MATERIALS_TABLE_HEADER.length);
  });

  it('shows carbon steel with its table values at 300 K and 800 K and its limit in °C', () => {
    // Incropera Table A.1 (from memory): k 60.5 (300 K), 39.2 (800 K); cp 434. Limit 723 K = 450 °C.
    const row = describeMaterialsTable().find((r) => r[0] === 'carbon-steel');
    expect(row?.slice(0, 8)).toEqual(['carbon-steel', 'solid', '7854', '60.5', '39.2', '434', '0.80', '450']);
  });

  it('shows the gap without solid properties', () => {
    const row = describeMaterialsTable().find((r) => r[0] === 'air-gap');
    expect(row?.slice(1, 6)).toEqual(['gap', '–', 'air', 'air', '–']);
  });
});
