/**
 * The wall's state at one instant with the mesh that produced it: what a run ends with (written as
 * state.json), what a later run may start from, and what the accuracy check starts its finer mesh
 * from. Moving a state to another mesh of the same wall interpolates each layer's temperatures
 * linearly in ln r between that layer's own nodes (the steady profile of a cylindrical layer with
 * constant conductivity is linear in ln r, so a steady state moves exactly); nodes at the same
 * radius keep their values, so a state on a mesh nested in the new one is copied where they meet.
 * A different wall (layers, thicknesses, flue radius, segments) is refused.
 */
import type { WallLayer, WallMesh } from '../physics/wall/mesh.ts';

/** Name and version of the state.json format (written by output/state.ts, read by input/state.ts). */
export const STATE_FORMAT = 'stackday wall state';
export const STATE_FORMAT_VERSION = 1;

/** One layer of a state's mesh. */
export interface WallStateLayer {
  readonly label: string;
  /** Material name. */
  readonly material: string;
  readonly kind: 'solid' | 'gap';
  /** Thickness, m. */
  readonly thickness: number;
  /** First and last node of the layer (for a gap: the nodes on either side). */
  readonly firstNode: number;
  readonly lastNode: number;
}

export interface WallState {
  /** Axial segments (bottom first). */
  readonly segments: number;
  /** Circumferential sectors of each segment (1: the averaged wall). */
  readonly sectors: number;
  /** Radius of the flue side, m. */
  readonly innerRadius: number;
  /** Node radii, m, inside → outside. */
  readonly nodeRadius: Float64Array;
  readonly nodeLabel: readonly string[];
  readonly layers: readonly WallStateLayer[];
  /** Node temperatures, K, by column (segment s, sector j: column s · sectors + j), [column · nodes + i]. */
  readonly temperatureK: Float64Array;
  /** The instant of the state, ISO local time (for messages and reports). */
  readonly timeLocal: string;
  /** The integrator's last step before the instant, s: a run continuing from the state starts with it, as the earlier run would have gone on. */
  readonly lastStepS?: number;
}

/** A wall state of `y` (K, [column · nodes + i]) on `mesh` at the instant `timeLocal`. */
export function wallStateOf(mesh: WallMesh, layers: readonly WallLayer[], segments: number, sectors: number, y: Float64Array, timeLocal: string, lastStepS?: number): WallState {
  return {
    segments,
    sectors,
    innerRadius: mesh.innerRadius,
    nodeRadius: Float64Array.from(mesh.radius),
    nodeLabel: [...mesh.label],
    layers: layers.map((l, j) => ({
      label: l.label,
      material: l.material.name,
      kind: l.material.kind,
      thickness: l.thickness,
      firstNode: mesh.layerNodes[j]![0],
      lastNode: mesh.layerNodes[j]![1],
    })),
    temperatureK: Float64Array.from(y),
    timeLocal,
    ...(lastStepS !== undefined ? { lastStepS } : {}),
  };
}

const mm = (m: number): string => `${Number((m * 1000).toFixed(2))} mm`;
const close = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

/**
 * Why a state cannot start a run on this wall (layers inside → outside, flue radius m, segments),
 * in words; null when the wall is the same (the cells may differ).
 */
export function wallStateMismatch(state: WallState, layers: readonly WallLayer[], innerRadius: number, segments: number, sectors = 1): string | null {
  if (state.segments !== segments) return `it has ${state.segments} axial segments, this run ${segments}`;
  if (state.sectors !== sectors) return `it has ${state.sectors} circumferential sector${state.sectors === 1 ? '' : 's'}, this run ${sectors}`;
  if (!close(state.innerRadius, innerRadius)) return `its flue radius is ${mm(state.innerRadius)}, this run's ${mm(innerRadius)}`;
  if (state.layers.length !== layers.length) return `it has ${state.layers.length} layers, this run ${layers.length}`;
  for (let j = 0; j < layers.length; j++) {
    const a = state.layers[j]!;
    const b = layers[j]!;
    if (a.material !== b.material.name || !close(a.thickness, b.thickness))
      return `layer ${j + 1} is ${a.material} ${mm(a.thickness)} there and ${b.material.name} ${mm(b.thickness)} here`;
  }
  return null;
}

/** Whether `state` sits on exactly the nodes of `mesh`. */
export function sameNodes(state: WallState, mesh: WallMesh): boolean {
  if (state.nodeRadius.length !== mesh.nodeCount) return false;
  for (let i = 0; i < mesh.nodeCount; i++) if (!close(state.nodeRadius[i]!, mesh.radius[i]!)) return false;
  return true;
}

/**
 * The temperatures of `state` on the nodes of `mesh` (the same wall, any cells), K, [column · nodes + i]
 * (module note). Throws a RangeError for a different wall.
 */
export function stateOnMesh(state: WallState, mesh: WallMesh, layers: readonly WallLayer[], segments: number, sectors = 1): Float64Array {
  const mismatch = wallStateMismatch(state, layers, mesh.innerRadius, segments, sectors);
  const columns = segments * sectors;
  if (mismatch !== null) throw new RangeError(`the wall state of ${state.timeLocal} belongs to a different wall: ${mismatch}`);
  if (sameNodes(state, mesh)) return Float64Array.from(state.temperatureK);
  const from = state.nodeRadius.length;
  const n = mesh.nodeCount;
  const out = new Float64Array(n * columns);
  layers.forEach((layer, j) => {
    if (layer.material.kind === 'gap') return;
    const [a0, a1] = [state.layers[j]!.firstNode, state.layers[j]!.lastNode];
    const [b0, b1] = mesh.layerNodes[j]!;
    for (let i = b0; i <= b1; i++) {
      const lnR = Math.log(mesh.radius[i]!);
      // the state's nodes of this layer that bracket the radius
      let k = a0;
      while (k < a1 - 1 && Math.log(state.nodeRadius[k + 1]!) < lnR) k++;
      const lo = Math.log(state.nodeRadius[k]!);
      const hi = Math.log(state.nodeRadius[k + 1]!);
      const w = Math.min(1, Math.max(0, (lnR - lo) / (hi - lo)));
      for (let s = 0; s < columns; s++) {
        const tLo = state.temperatureK[s * from + k]!;
        const tHi = state.temperatureK[s * from + k + 1]!;
        out[s * n + i] = tLo + w * (tHi - tLo);
      }
    }
  });
  return out;
}
