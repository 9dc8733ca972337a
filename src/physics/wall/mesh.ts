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
 *
 * Cells: a layer with a given cell count gets that many equal cells; a layer with `auto` gets the
 * automatic rule of cells.ts — graded from the faces the forcing acts on (every layer's inner face
 * with the flue side's time scale, the outermost layer's outer face with the outside's), fine at
 * the face and growing inward. The time scales are computed by the model from the scenario and
 * passed in (`MeshForcing`); without them both faces get the daily time scale.
 */
import type { Material } from '../materials/types.ts';
import { makeTableLookup, integrateTable } from '../properties/table.ts';
import { autoLayerCells, uniformLayerCells, DAILY_TIME_SCALE_S, type LayerCells } from './cells.ts';

/** The temperature at which a layer's diffusivity sizes its automatic cells, K. */
const MESH_DIFFUSIVITY_TEMPERATURE_K = 400;

/** The forcing the automatic mesh must resolve, and a refinement of the whole mesh. */
export interface MeshForcing {
  /** Shortest time scale of the forcing at the flue side (gas temperature and flow), s. */
  readonly flueSideTimeScaleS: number;
  /** Shortest time scale of the forcing at the outer surface (weather), s. */
  readonly outsideTimeScaleS: number;
  /** Every layer's cells × this whole number (default 1): the nested finer mesh of an accuracy check. */
  readonly refinement?: number;
}

/** Daily time scales on both faces and no refinement: the mesh when nothing faster forces the wall. */
export const DAILY_FORCING: MeshForcing = { flueSideTimeScaleS: DAILY_TIME_SCALE_S, outsideTimeScaleS: DAILY_TIME_SCALE_S };

/** One layer of the wall as the mesh needs it (the model's `LayerInput`). SI units. */
export interface WallLayer {
  /** Label for reports, e.g. `liner`, `insulation`, `shell`. */
  readonly label: string;
  readonly material: Material;
  /** Layer thickness, m. */
  readonly thickness: number;
  /** Cells across the layer, or `auto` (graded to the forcing, cells.ts). Ignored for gaps. */
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
  /** Conduction links: the layer's material (its conductivity table). */
  readonly linkMaterial: readonly (Material | null)[];
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
  /** Cells of each layer, inside → outside (0 for a gap). */
  readonly layerCells: readonly number[];
  /** Indices of the automatic layers whose cell count MAX_AUTO_CELLS capped. */
  readonly cappedLayers: readonly number[];
}

/** Thermal diffusivity k/(ρ c_p) of a solid material at temperature T, m²/s. */
export function thermalDiffusivity(material: Material, temperatureK: number): number {
  const k = makeTableLookup(material.conductivity)(temperatureK);
  const cp = makeTableLookup(material.specificHeat)(temperatureK);
  return k / (material.density * cp);
}

/**
 * The cells of layer j of `layers` under `forcing`: the given count (× the refinement) or the
 * automatic rule, the inner face forced from the flue side and the outermost layer's outer face
 * from outside.
 */
export function layerCells(layers: readonly WallLayer[], j: number, forcing: MeshForcing): LayerCells {
  const layer = layers[j]!;
  const refinement = forcing.refinement ?? 1;
  if (layer.cells !== 'auto') return uniformLayerCells(layer.thickness, layer.cells * refinement);
  const outermost = j === layers.length - 1;
  return autoLayerCells(
    layer.thickness,
    thermalDiffusivity(layer.material, MESH_DIFFUSIVITY_TEMPERATURE_K),
    { innerTimeScaleS: forcing.flueSideTimeScaleS + diffusionTimeBefore(layers, j), outerTimeScaleS: outermost ? forcing.outsideTimeScaleS : Infinity },
    refinement,
  );
}

/**
 * Σ L²/α over the solid layers inside layer j, s: a disturbance from the flue reaches layer j
 * smoothed over at least the diffusion time of each layer it crossed (gaps and contacts store no
 * heat and add none).
 */
export function diffusionTimeBefore(layers: readonly WallLayer[], j: number): number {
  let total = 0;
  for (let k = 0; k < j; k++) {
    const l = layers[k]!;
    if (l.material.kind === 'solid') total += (l.thickness * l.thickness) / thermalDiffusivity(l.material, MESH_DIFFUSIVITY_TEMPERATURE_K);
  }
  return total;
}

/**
 * Build the mesh for the wall layers (inside → outside) starting at the flue radius `innerRadius`,
 * with automatic layers graded to `forcing` (default: the daily wave on both faces).
 */
export function buildWallMesh(layers: readonly WallLayer[], innerRadius: number, forcing: MeshForcing = DAILY_FORCING): WallMesh {
  const radius: number[] = [];
  const label: string[] = [];
  const layerNodes: [number, number][] = [];
  const linkKind: number[] = [];
  const linkGeometry: number[] = [];
  const linkConductivity: (((T: number) => number) | null)[] = [];
  const linkMaterial: (Material | null)[] = [];
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
  const cellCounts: number[] = [];
  const cappedLayers: number[] = [];

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
  const addLink = (kind: number, geometry: number, k: ((T: number) => number) | null, gap: GapLink | null, material: Material | null = null) => {
    linkKind.push(kind);
    linkGeometry.push(geometry);
    linkConductivity.push(k);
    linkGap.push(gap);
    linkMaterial.push(material);
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
      cellCounts.push(0);
      r = rOut;
      return;
    }
    const { faces, capped } = layerCells(layers, j, forcing);
    const cells = faces.length - 1;
    cellCounts.push(cells);
    if (capped) cappedLayers.push(j);
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
    for (let c = 1; c <= cells; c++) {
      const ra = rIn + faces[c - 1]!;
      const rb = c === cells ? rOut : rIn + faces[c]!;
      const isLast = c === cells;
      const lastName = j === layers.length - 1 ? 'outer_surface' : layer.contactResistanceToNext > 0 ? `${interfaceName(j + 1)}_in` : layers[j + 1]!.material.kind === 'gap' ? interfaceName(j + 1) : interfaceName(j + 1);
      const node = addNode(rb, isLast ? lastName : `node_${radius.length}`);
      addLink(LINK_CONDUCTION, (2 * Math.PI) / Math.log(rb / ra), kLookup, null, layer.material);
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
    linkMaterial,
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
    layerCells: cellCounts,
    cappedLayers,
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
