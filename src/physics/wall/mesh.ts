/**
 * Radial finite-volume mesh of the layered wall of one axial segment (docs/model.md "Wall").
 *
 * Vertex-centred finite volumes: each solid layer of thickness L cut into n cells gets n + 1 nodes,
 * the first and last on the layer's surfaces, so surface and interface temperatures are computed,
 * not extrapolated. A node on a perfect-contact interface is shared by the two layers (its control
 * volume is half a cell of each). A contact resistance or an air gap between two layers gives each
 * side its own surface node, joined by the resistance or by the gap's conductance (which has no
 * heat capacity). Between neighbouring nodes of one layer the conductance per unit height is the
 * cylindrical-shell value 2πk / ln(r_b / r_a), with k taken at the mean of the two node temperatures;
 * node control volumes run between the radii of the cell mid-points (half-cells at the surfaces).
 * Axial conduction is neglected (radial conduction dominates in slender walls).
 */
import type { Material } from '../materials/types.ts';
import { makeTableLookup, integrateTable } from '../properties/table.ts';
import { SECONDS_PER_DAY } from '../constants.ts';

/** One layer of the wall as the mesh needs it (the model's `LayerInput`). SI units. */
export interface WallLayer {
  /** Label for reports, e.g. `liner`, `insulation`, `shell`. */
  readonly label: string;
  readonly material: Material;
  /** Layer thickness, m. */
  readonly thickness: number;
  /** Cells across the layer, or `auto` (sized to the daily penetration depth). Ignored for gaps. */
  readonly cells: number | 'auto';
  /** Contact resistance to the next layer outward, m² K/W (0 = perfect contact). */
  readonly contactResistanceToNext: number;
}

export const LINK_CONDUCTION = 0;
export const LINK_CONTACT = 1;
export const LINK_GAP = 2;

export interface GapLink {
  readonly innerRadius: number;
  readonly outerRadius: number;
  readonly innerEmissivity: number;
  readonly outerEmissivity: number;
}

export interface WallMesh {
  readonly nodeCount: number;
  /** Node radii, m (inside → outside). */
  readonly radius: Float64Array;
  /** Position label of each node: `inner_surface`, `interface_1`, `interface_1_in`, `node_5`, `outer_surface`. */
  readonly label: readonly string[];
  /** For each layer, its first and last node index (for a gap: the nodes on either side). */
  readonly layerNodes: readonly (readonly [number, number])[];
  /** Link i joins node i and node i + 1: its kind. */
  readonly linkKind: Uint8Array;
  /** Conduction links: 2π / ln(r_b / r_a), m⁰; contact links: 2π r / R_c, W/(m K); gap links: unused. */
  readonly linkGeometry: Float64Array;
  /** Conduction links: k(T) lookup of the layer's material. */
  readonly linkConductivity: readonly (((T: number) => number) | null)[];
  /** Gap links: the gap's geometry and surface emissivities. */
  readonly linkGap: readonly (GapLink | null)[];
  /** Up to two capacity parts per node: mass per metre of height (kg/m) and cp(T) lookup. */
  readonly capMassA: Float64Array;
  readonly capCpA: readonly ((T: number) => number)[];
  readonly capMassB: Float64Array;
  readonly capCpB: readonly (((T: number) => number) | null)[];
  /** Materials of the capacity parts (for stored-energy integrals). */
  readonly capMaterialA: readonly Material[];
  readonly capMaterialB: readonly (Material | null)[];
  /**
   * Round the circumference (sector models): the radial extent of each capacity part of node i, m,
   * and, for the two faces of an air gap, the gap's width, m (0 elsewhere) and the mean of the two
   * face emissivities' radiation factor 1/(1/ε₁ + 1/ε₂ − 1).
   */
  readonly radialExtentA: Float64Array;
  readonly radialExtentB: Float64Array;
  readonly gapWidthAtNode: Float64Array;
  readonly gapRadiationFactorAtNode: Float64Array;
  readonly innerRadius: number;
  readonly outerRadius: number;
}

/** Thermal diffusivity k/(ρ c_p) of a solid material at temperature T, m²/s. */
export function thermalDiffusivity(material: Material, temperatureK: number): number {
  const k = makeTableLookup(material.conductivity)(temperatureK);
  const cp = makeTableLookup(material.specificHeat)(temperatureK);
  return k / (material.density * cp);
}

/**
 * Automatic cell count of a layer: cells no thicker than an eighth of the daily penetration depth
 * δ = √(2α/ω) = √(α P / π) (Carslaw & Jaeger 1959, §2.6), at least 2 and at most 24.
 */
export function autoCellCount(material: Material, thickness: number): number {
  const alpha = thermalDiffusivity(material, 400);
  const depth = Math.sqrt((alpha * SECONDS_PER_DAY) / Math.PI);
  return Math.min(24, Math.max(2, Math.ceil(thickness / (depth / 8))));
}

/** Build the mesh for the wall layers (inside → outside) starting at the flue radius `innerRadius`. */
export function buildWallMesh(layers: readonly WallLayer[], innerRadius: number): WallMesh {
  const radius: number[] = [];
  const label: string[] = [];
  const layerNodes: [number, number][] = [];
  const linkKind: number[] = [];
  const linkGeometry: number[] = [];
  const linkConductivity: (((T: number) => number) | null)[] = [];
  const linkGap: (GapLink | null)[] = [];
  const capMassA: number[] = [];
  const capCpA: ((T: number) => number)[] = [];
  const capMassB: number[] = [];
  const capCpB: (((T: number) => number) | null)[] = [];
  const capMaterialA: Material[] = [];
  const capMaterialB: (Material | null)[] = [];
  const radialExtentA: number[] = [];
  const radialExtentB: number[] = [];
  const gapWidthAtNode: number[] = [];
  const gapRadiationFactorAtNode: number[] = [];

  const addNode = (r: number, name: string) => {
    radius.push(r);
    label.push(name);
    capMassA.push(0);
    capCpA.push(() => 0);
    capMassB.push(0);
    capCpB.push(null);
    capMaterialA.push(null as unknown as Material);
    capMaterialB.push(null);
    radialExtentA.push(0);
    radialExtentB.push(0);
    gapWidthAtNode.push(0);
    gapRadiationFactorAtNode.push(0);
    return radius.length - 1;
  };
  const addCapacity = (node: number, material: Material, rIn: number, rOut: number) => {
    const mass = material.density * Math.PI * (rOut * rOut - rIn * rIn);
    if (capMaterialA[node] === null || capMaterialA[node] === material) {
      capMassA[node] += mass;
      capCpA[node] = makeTableLookup(material.specificHeat);
      capMaterialA[node] = material;
      radialExtentA[node] += rOut - rIn;
    } else {
      capMassB[node] += mass;
      capCpB[node] = makeTableLookup(material.specificHeat);
      capMaterialB[node] = material;
      radialExtentB[node] += rOut - rIn;
    }
  };
  const addLink = (kind: number, geometry: number, k: ((T: number) => number) | null, gap: GapLink | null) => {
    linkKind.push(kind);
    linkGeometry.push(geometry);
    linkConductivity.push(k);
    linkGap.push(gap);
  };

  let r = innerRadius;
  let pendingLink: { kind: number; geometry: number; gap: GapLink | null } | null = null;
  let current = -1; // last node created
  let pendingGapFace: { width: number; factor: number } | null = null; // the outer face of a gap awaits its node
  const interfaceName = (b: number) => `interface_${b}`;

  layers.forEach((layer, j) => {
    const rIn = r;
    const rOut = r + layer.thickness;
    if (layer.material.kind === 'gap') {
      if (j === 0 || j === layers.length - 1) throw new RangeError('an air gap cannot be the innermost or outermost layer');
      const prev = layers[j - 1]!.material;
      const next = layers[j + 1]!.material;
      pendingLink = {
        kind: LINK_GAP,
        geometry: 0,
        gap: { innerRadius: rIn, outerRadius: rOut, innerEmissivity: prev.emissivity, outerEmissivity: next.emissivity },
      };
      layerNodes.push([current, current + 1]);
      // its two faces: the node before it and the next node to be made
      gapWidthAtNode[current] = layer.thickness;
      pendingGapFace = { width: layer.thickness, factor: 1 / (1 / prev.emissivity + 1 / next.emissivity - 1) };
      gapRadiationFactorAtNode[current] = pendingGapFace.factor;
      r = rOut;
      return;
    }
    const cells = layer.cells === 'auto' ? autoCellCount(layer.material, layer.thickness) : layer.cells;
    const kLookup = makeTableLookup(layer.material.conductivity);
    const shareFirst = current >= 0 && pendingLink === null;
    let first: number;
    if (shareFirst) {
      first = current;
    } else {
      const name = j === 0 ? 'inner_surface' : pendingLink?.kind === LINK_CONTACT ? `${interfaceName(j)}_out` : interfaceName(j);
      first = addNode(rIn, name);
      if (pendingGapFace) {
        gapWidthAtNode[first] = pendingGapFace.width;
        gapRadiationFactorAtNode[first] = pendingGapFace.factor;
        pendingGapFace = null;
      }
      if (pendingLink) {
        addLink(pendingLink.kind, pendingLink.geometry, null, pendingLink.gap);
        pendingLink = null;
      }
    }
    const dr = layer.thickness / cells;
    for (let c = 1; c <= cells; c++) {
      const ra = rIn + (c - 1) * dr;
      const rb = c === cells ? rOut : rIn + c * dr;
      const isLast = c === cells;
      const lastName = j === layers.length - 1 ? 'outer_surface' : layer.contactResistanceToNext > 0 ? `${interfaceName(j + 1)}_in` : layers[j + 1]!.material.kind === 'gap' ? interfaceName(j + 1) : interfaceName(j + 1);
      const node = addNode(rb, isLast ? lastName : `node_${radius.length}`);
      addLink(LINK_CONDUCTION, (2 * Math.PI) / Math.log(rb / ra), kLookup, null);
      const rm = 0.5 * (ra + rb);
      addCapacity(node - 1, layer.material, ra, rm);
      addCapacity(node, layer.material, rm, rb);
    }
    current = radius.length - 1;
    layerNodes.push([first, current]);
    if (j < layers.length - 1 && layer.contactResistanceToNext > 0 && layers[j + 1]!.material.kind !== 'gap') {
      pendingLink = { kind: LINK_CONTACT, geometry: (2 * Math.PI * rOut) / layer.contactResistanceToNext, gap: null };
    }
    r = rOut;
  });
  // rename node labels so interior nodes are numbered by their index (node_k = k-th node from inside)
  for (let i = 0; i < label.length; i++) if (label[i]!.startsWith('node_')) label[i] = `node_${i}`;

  return {
    nodeCount: radius.length,
    radius: Float64Array.from(radius),
    label,
    layerNodes,
    linkKind: Uint8Array.from(linkKind),
    linkGeometry: Float64Array.from(linkGeometry),
    linkConductivity,
    linkGap,
    capMassA: Float64Array.from(capMassA),
    capCpA,
    capMassB: Float64Array.from(capMassB),
    capCpB,
    capMaterialA,
    capMaterialB,
    radialExtentA: Float64Array.from(radialExtentA),
    radialExtentB: Float64Array.from(radialExtentB),
    gapWidthAtNode: Float64Array.from(gapWidthAtNode),
    gapRadiationFactorAtNode: Float64Array.from(gapRadiationFactorAtNode),
    innerRadius,
    outerRadius: r,
  };
}

/** Heat capacity of node i per metre of height at temperature T, J/(m K). */
export function nodeCapacity(mesh: WallMesh, i: number, temperatureK: number): number {
  const b = mesh.capCpB[i];
  return mesh.capMassA[i]! * mesh.capCpA[i]!(temperatureK) + (b ? mesh.capMassB[i]! * b(temperatureK) : 0);
}

/** Sensible heat stored in node i per metre of height between T1 and T2, J/m (exact for tabulated cp). */
export function nodeEnthalpyChange(mesh: WallMesh, i: number, t1K: number, t2K: number): number {
  const b = mesh.capMaterialB[i];
  return (
    mesh.capMassA[i]! * integrateTable(mesh.capMaterialA[i]!.specificHeat, t1K, t2K) +
    (b ? mesh.capMassB[i]! * integrateTable(b.specificHeat, t1K, t2K) : 0)
  );
}
