/**
 * state.json: the wall at the end of a run — every node temperature of every segment with the mesh
 * that produced it — so that a later run can start from it (`initial: {from: state.json}`, read by
 * src/input/state.ts). Temperatures in kelvin at full precision, so that a restart continues the
 * run exactly.
 */
import { STATE_FORMAT, STATE_FORMAT_VERSION, type WallState } from '../model/wallState.ts';

/** state.json text for `state` of the scenario `scenario`, written by stackday `toolVersion`. */
export function stateJson(state: WallState, scenario: string, toolVersion: string): string {
  const n = state.nodeRadius.length;
  const document = {
    format: STATE_FORMAT,
    format_version: STATE_FORMAT_VERSION,
    tool_version: toolVersion,
    scenario,
    time_local: state.timeLocal,
    ...(state.lastStepS !== undefined ? { last_step_s: state.lastStepS } : {}),
    segments: state.segments,
    sectors: state.sectors,
    inner_radius_m: state.innerRadius,
    layers: state.layers.map((l) => ({ label: l.label, material: l.material, kind: l.kind, thickness_m: l.thickness, first_node: l.firstNode, last_node: l.lastNode })),
    node_radius_m: Array.from(state.nodeRadius),
    node_label: state.nodeLabel,
    temperature_k: Array.from({ length: state.segments * state.sectors }, (_, s) => Array.from(state.temperatureK.subarray(s * n, (s + 1) * n))),
  };
  return `${JSON.stringify(document)}\n`;
}
