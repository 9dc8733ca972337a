/** The radial mesh: geometry and capacities by exact geometry, labels, contact and gap links. */
import { describe, it, expect } from 'vitest';
import { buildWallMesh, nodeCapacity, nodeEnthalpyChange, LINK_CONTACT, LINK_GAP } from '../../../src/physics/wall/mesh.ts';
import { gapConductancePerMetre } from '../../../src/physics/wall/gap.ts';
import { findMaterial } from '../../../src/physics/materials/index.ts';
import { airPropertiesAt } from '../../../src/physics/properties/air.ts';
import { STEFAN_BOLTZMANN } from '../../../src/physics/constants.ts';
import { constantMaterial, layer } from '../../model/fixtures.ts';

const a = constantMaterial('a', 1.0, 2000, 900);
const b = constantMaterial('b', 0.1, 300, 800);

describe('buildWallMesh', () => {
  it('puts nodes on every surface and interface and labels them', () => {
    const m = buildWallMesh([layer(a, 0.1, 4), layer(b, 0.05, 2)], 1);
    expect(m.nodeCount).toBe(4 + 2 + 1); // shared interface node
    expect(m.label[0]).toBe('inner_surface');
    expect(m.label[4]).toBe('interface_1');
    expect(m.label[6]).toBe('outer_surface');
    expect(m.radius[4]).toBeCloseTo(1.1, 12);
    expect(m.radius[6]).toBeCloseTo(1.15, 12);
    expect(m.layerNodes).toEqual([[0, 4], [4, 6]]);
  });

  it('gives node capacities that add up to each layer’s mass × c_p (ρ π (r_o² − r_i²), exact geometry)', () => {
    const m = buildWallMesh([layer(a, 0.1, 4), layer(b, 0.05, 3)], 1);
    let total = 0;
    for (let i = 0; i < m.nodeCount; i++) total += nodeCapacity(m, i, 300);
    const exact = 2000 * 900 * Math.PI * (1.1 ** 2 - 1) + 300 * 800 * Math.PI * (1.15 ** 2 - 1.1 ** 2);
    expect(total / exact).toBeCloseTo(1, 12);
    // stored heat over 100 K with constant c_p is C·ΔT
    let stored = 0;
    for (let i = 0; i < m.nodeCount; i++) stored += nodeEnthalpyChange(m, i, 300, 400);
    expect(stored / (exact * 100)).toBeCloseTo(1, 12);
  });

  it('splits an interface with a contact resistance into two nodes joined by 2πr/R″', () => {
    const m = buildWallMesh([layer(a, 0.1, 2, 0.01), layer(b, 0.05, 2)], 1);
    expect(m.label).toEqual(['inner_surface', 'node_1', 'interface_1_in', 'interface_1_out', 'node_4', 'outer_surface']);
    expect(m.linkKind[2]).toBe(LINK_CONTACT);
    expect(m.linkGeometry[2]).toBeCloseTo((2 * Math.PI * 1.1) / 0.01, 9);
  });

  it('joins the two sides of an air gap by a gap link without nodes inside', () => {
    const gap = findMaterial('air-gap')!;
    const m = buildWallMesh([layer(a, 0.1, 2), layer(gap, 0.02), layer(b, 0.05, 2)], 1);
    expect(m.nodeCount).toBe(6);
    expect(m.linkKind[2]).toBe(LINK_GAP);
    expect(m.radius[3]! - m.radius[2]!).toBeCloseTo(0.02, 12);
  });

  it('refuses an air gap on the inside or outside', () => {
    const gap = findMaterial('air-gap')!;
    expect(() => buildWallMesh([layer(gap, 0.02), layer(a, 0.1, 2)], 1)).toThrow(/air gap/);
  });
});

describe('gapConductancePerMetre', () => {
  it('is still-air conduction plus grey radiation between concentric cylinders for a narrow gap', () => {
    // Incropera & DeWitt eq. 13.25 (radiation between long concentric cylinders) and eq. 3.27
    // (conduction through a cylindrical shell); the gap is 5 mm with 1 K across it, so natural
    // convection does not start (Raithby–Hollands ratio = 1).
    const g = { innerRadius: 1, outerRadius: 1.005, innerEmissivity: 0.8, outerEmissivity: 0.6 };
    const t1 = 400.5;
    const t2 = 399.5;
    const air = airPropertiesAt(400);
    const conduction = (2 * Math.PI * air.conductivity) / Math.log(1.005);
    const radiation = (2 * Math.PI * 1 * STEFAN_BOLTZMANN * (t1 * t1 + t2 * t2) * (t1 + t2)) / (1 / 0.8 + (1 / 1.005) * (1 / 0.6 - 1));
    expect(gapConductancePerMetre(g, t1, t2) / (conduction + radiation)).toBeCloseTo(1, 9);
  });
});
