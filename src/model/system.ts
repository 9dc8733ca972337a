/**
 * The semi-discrete wall model of the whole stack as an ODE system C(T) dT/dt = f(t, T)
 * (design.md sections 2–4), in the form the integrators take: dT/dt = f / C.
 *
 * Unknowns: node temperatures, segment by segment from the bottom (index s·n + i). Flue side: the
 * gas marches up quasi-steadily, each segment taking heat ṁ c_p (T_in − T_out) with
 * T_out = T_w + (T_in − T_w) exp(−h π D Δz / (ṁ c_p)). Outside: convection, radiation to sky and
 * ground, absorbed sun. Quadrature channels (W, whole stack): heat from the gas into the wall,
 * outside convection, outside radiation, absorbed sun.
 */
import type { OdeSystem } from '../solver/types.ts';
import type { ModelInputs } from './inputs.ts';
import { LINK_CONDUCTION, LINK_CONTACT, nodeCapacity, type WallMesh } from '../physics/wall/mesh.ts';
import { gapConductancePerMetre } from '../physics/wall/gap.ts';
import { evaluateDrivers, emptyDrivers, type DriverContext, type Drivers } from './drivers.ts';
import { airPropertiesAt, airPropertiesInto } from '../physics/properties/air.ts';
import { outsideFilmCoefficient } from '../physics/correlations/external.ts';
import { nuPipeBlended } from '../physics/correlations/internal.ts';
import { radiationToSkyAndGround, radiationCoefficientToSkyAndGround } from '../physics/correlations/radiation.ts';
import type { GasPropertyLookup } from '../physics/properties/flueGas.ts';

export const AUX_GAS_TO_WALL = 0;
export const AUX_CONVECTION = 1;
export const AUX_RADIATION = 2;
export const AUX_SUN = 3;
export const AUX_SIZE = 4;

/** Per-segment quantities at one instant (W per metre of height, K, W/(m² K), m/s). */
export interface SegmentDiagnostics {
  gasInK: Float64Array;
  gasOutK: Float64Array;
  insideFilm: Float64Array;
  gasToWallPerMetre: Float64Array;
  windAtHeight: Float64Array;
  outsideFilm: Float64Array;
  convectionPerMetre: Float64Array;
  radiationPerMetre: Float64Array;
  sunPerMetre: Float64Array;
  reynoldsInside: Float64Array;
  prandtlInside: Float64Array;
  /** Outside Reynolds number on the outer diameter, Rayleigh number on the height, film Prandtl number (NaN with a fixed film coefficient). */
  reynoldsOutside: Float64Array;
  rayleighOutside: Float64Array;
  prandtlOutside: Float64Array;
}

export function makeSegmentDiagnostics(segments: number): SegmentDiagnostics {
  const f = () => new Float64Array(segments);
  return {
    gasInK: f(),
    gasOutK: f(),
    insideFilm: f(),
    gasToWallPerMetre: f(),
    windAtHeight: f(),
    outsideFilm: f(),
    convectionPerMetre: f(),
    radiationPerMetre: f(),
    sunPerMetre: f(),
    reynoldsInside: f(),
    prandtlInside: f(),
    reynoldsOutside: f(),
    rayleighOutside: f(),
    prandtlOutside: f(),
  };
}

export interface StackGeometry {
  readonly segments: number;
  readonly segmentLength: number;
  /** Mid-height of each segment, m. */
  readonly midHeight: Float64Array;
  /** Power-law wind factor (z/z_ref)^α of each segment. */
  readonly windFactor: Float64Array;
  readonly innerDiameter: number;
  readonly outerDiameter: number;
}

export class StackWallSystem implements OdeSystem {
  readonly size: number;
  readonly auxSize = AUX_SIZE;
  readonly n: number;
  private readonly drivers: Drivers = emptyDrivers();
  private readonly conductance: Float64Array;
  private readonly capacity: Float64Array;
  private readonly innerSink: Float64Array; // −∂q'_in/∂T_0 per segment (≥ 0)
  private readonly outerSink: Float64Array; // ∂q'_out/∂T_N per segment (≥ 0, heat leaving)
  /** Per segment, W per metre of height: from the gas into the wall, convection and radiation out, sun in. */
  private readonly flueToWall: Float64Array;
  private readonly convectionOut: Float64Array;
  private readonly radiationOut: Float64Array;
  private readonly sunIn: Float64Array;
  private readonly film = airPropertiesAt(300);
  /** Instant and state fingerprint at which `innerSink`/`outerSink` were last computed (reused by `jacobian`). */
  private sinksT = Number.NaN;
  private sinksFingerprint = Number.NaN;

  constructor(
    readonly inputs: ModelInputs,
    readonly mesh: WallMesh,
    readonly geometry: StackGeometry,
    readonly ctx: DriverContext,
    readonly gas: GasPropertyLookup,
  ) {
    this.n = mesh.nodeCount;
    this.size = this.n * geometry.segments;
    this.conductance = new Float64Array(Math.max(1, this.n - 1));
    this.capacity = new Float64Array(this.n);
    this.innerSink = new Float64Array(geometry.segments);
    this.outerSink = new Float64Array(geometry.segments);
    this.flueToWall = new Float64Array(geometry.segments);
    this.convectionOut = new Float64Array(geometry.segments);
    this.radiationOut = new Float64Array(geometry.segments);
    this.sunIn = new Float64Array(geometry.segments);
  }

  /** Conductances per metre of height of the links of the segment whose nodes start at offset o. */
  private fillConductances(y: Float64Array, o: number): void {
    const mesh = this.mesh;
    for (let i = 0; i < this.n - 1; i++) {
      const ta = y[o + i]!;
      const tb = y[o + i + 1]!;
      const kind = mesh.linkKind[i];
      this.conductance[i] =
        kind === LINK_CONDUCTION
          ? mesh.linkGeometry[i]! * mesh.linkConductivity[i]!(0.5 * (ta + tb))
          : kind === LINK_CONTACT
            ? mesh.linkGeometry[i]!
            : gapConductancePerMetre(mesh.linkGap[i]!, ta, tb);
    }
  }

  driversAt(t: number): Drivers {
    if (this.drivers.t !== t) evaluateDrivers(this.ctx, t, this.drivers);
    return this.drivers;
  }

  /** dT/dt and the quadrature rates (whole-stack heat flows) at (t, y). */
  rhs(t: number, y: Float64Array, dydt: Float64Array, aux: Float64Array): void {
    const { mesh, geometry } = this;
    const n = this.n;
    this.boundaries(t, y, null);
    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      this.fillConductances(y, o);
      for (let i = 0; i < n; i++) {
        this.capacity[i] = nodeCapacity(mesh, i, y[o + i]!);
        dydt[o + i] = 0;
      }
      for (let i = 0; i < n - 1; i++) {
        const q = this.conductance[i]! * (y[o + i]! - y[o + i + 1]!);
        dydt[o + i] -= q;
        dydt[o + i + 1] += q;
      }
      dydt[o] += this.flueToWall[s]!;
      dydt[o + n - 1] += this.sunIn[s]! - this.convectionOut[s]! - this.radiationOut[s]!;
      for (let i = 0; i < n; i++) dydt[o + i] /= this.capacity[i]!;
    }
    const dz = geometry.segmentLength;
    let qGas = 0;
    let qConv = 0;
    let qRad = 0;
    let qSun = 0;
    for (let s = 0; s < geometry.segments; s++) {
      qGas += this.flueToWall[s]! * dz;
      qConv += this.convectionOut[s]! * dz;
      qRad += this.radiationOut[s]! * dz;
      qSun += this.sunIn[s]! * dz;
    }
    aux[AUX_GAS_TO_WALL] = qGas;
    aux[AUX_CONVECTION] = qConv;
    aux[AUX_RADIATION] = qRad;
    aux[AUX_SUN] = qSun;
  }

  /**
   * Flue side and outside of every segment at (t, y): heat from the gas into the inner surface
   * (marching the gas up), and convection, radiation and absorbed sun at the outer surface, each
   * per metre of height, with their derivatives for the Jacobian. With `diag`, also the
   * per-segment quantities reports need (no conduction is evaluated).
   */
  boundaries(t: number, y: Float64Array, diag: SegmentDiagnostics | null): void {
    const d = this.driversAt(t);
    const { geometry, inputs } = this;
    const n = this.n;
    const dz = geometry.segmentLength;
    const di = geometry.innerDiameter;
    const dOut = geometry.outerDiameter;
    const perimeter = Math.PI * dOut;
    const flue = inputs.flue;
    const outside = inputs.outside;
    const eps = inputs.surface.emissivity;
    const massFlow = d.massFlow;
    let gasIn = d.inletTemperatureK;

    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      // --- flue side ---
      const tw = y[o]!;
      const props = this.gas(gasIn);
      const reynolds = (4 * massFlow) / (Math.PI * di * props.dynamicViscosity);
      const hIn = flue.filmCoefficient ?? (nuPipeBlended(reynolds, props.prandtl) * props.conductivity) / di;
      let qIn: number;
      let gasOut: number;
      if (flue.gasCooling) {
        const capacityRate = massFlow * props.specificHeat;
        const ntu = (hIn * Math.PI * di * dz) / capacityRate;
        const effectiveness = -Math.expm1(-ntu);
        gasOut = gasIn - (gasIn - tw) * effectiveness;
        qIn = (capacityRate * (gasIn - gasOut)) / dz;
        this.innerSink[s] = (capacityRate * effectiveness) / dz;
      } else {
        gasOut = gasIn;
        qIn = hIn * Math.PI * di * (gasIn - tw);
        this.innerSink[s] = hIn * Math.PI * di;
      }
      this.flueToWall[s] = qIn;

      // --- outside ---
      const ts = y[o + n - 1]!;
      const wind = d.windSpeedRef * geometry.windFactor[s]!;
      let hOut: number;
      let reOut = Number.NaN;
      let raOut = Number.NaN;
      if (outside.filmCoefficient !== undefined) hOut = outside.filmCoefficient;
      else {
        const air = airPropertiesInto(this.film, 0.5 * (ts + d.airTemperatureK));
        const film = outsideFilmCoefficient(
          { windSpeed: wind, outerDiameter: dOut, height: inputs.stack.height, surfaceTemperatureK: ts, airTemperatureK: d.airTemperatureK },
          air,
        );
        hOut = film.h;
        reOut = film.re;
        raOut = film.ra;
      }
      const qc = hOut * perimeter * (ts - d.airTemperatureK);
      let qr = 0;
      let hr = 0;
      if (outside.radiation.kind === 'sky-ground') {
        qr = radiationToSkyAndGround(ts, eps, d.skyTemperatureK, d.groundTemperatureK) * perimeter;
        hr = radiationCoefficientToSkyAndGround(ts, eps) * perimeter;
      } else if (outside.radiation.kind === 'surroundings') {
        // surroundings at one temperature: sky and ground both at it
        qr = radiationToSkyAndGround(ts, eps, d.skyTemperatureK, d.skyTemperatureK) * perimeter;
        hr = radiationCoefficientToSkyAndGround(ts, eps) * perimeter;
      }
      this.convectionOut[s] = qc;
      this.radiationOut[s] = qr;
      this.sunIn[s] = d.sunPerMetre;
      this.outerSink[s] = hOut * perimeter + hr;

      if (diag) {
        diag.gasInK[s] = gasIn;
        diag.gasOutK[s] = gasOut;
        diag.insideFilm[s] = hIn;
        diag.gasToWallPerMetre[s] = qIn;
        diag.windAtHeight[s] = wind;
        diag.outsideFilm[s] = hOut;
        diag.convectionPerMetre[s] = qc;
        diag.radiationPerMetre[s] = qr;
        diag.sunPerMetre[s] = d.sunPerMetre;
        diag.reynoldsInside[s] = reynolds;
        diag.prandtlInside[s] = props.prandtl;
        diag.reynoldsOutside[s] = reOut;
        diag.rayleighOutside[s] = raOut;
        diag.prandtlOutside[s] = outside.filmCoefficient === undefined ? this.film.prandtl : Number.NaN;
      }
      gasIn = gasOut;
    }
    this.sinksT = t;
    this.sinksFingerprint = fingerprint(y);
  }

  /**
   * Tridiagonal Jacobian of dT/dt: conduction with conductances frozen at the current state, the
   * local flue-side and outside sinks on the surface nodes. The dependence of a segment's inlet gas
   * temperature on the walls below is left out (it only slows Newton a little).
   */
  jacobian(t: number, y: Float64Array, lower: Float64Array, diag: Float64Array, upper: Float64Array): void {
    // the surface sinks at this state (already there when the last rhs call was at this state)
    const n = this.n;
    if (!(this.sinksT === t && this.sinksFingerprint === fingerprint(y))) this.boundaries(t, y, null);
    const { mesh, geometry } = this;
    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      this.fillConductances(y, o);
      for (let i = 0; i < n; i++) {
        const c = nodeCapacity(mesh, i, y[o + i]!);
        const gl = i > 0 ? this.conductance[i - 1]! : 0;
        const gu = i < n - 1 ? this.conductance[i]! : 0;
        let dd = -(gl + gu);
        if (i === 0) dd -= this.innerSink[s]!;
        if (i === n - 1) dd -= this.outerSink[s]!;
        lower[o + i] = i > 0 ? gl / c : 0;
        upper[o + i] = i < n - 1 ? gu / c : 0;
        diag[o + i] = dd / c;
      }
    }
  }
}

/** A cheap fingerprint of a state vector (position-weighted sum), to recognise a repeated state. */
function fingerprint(y: Float64Array): number {
  let s = 0;
  for (let i = 0; i < y.length; i++) s += y[i]! * (i + 1);
  return s;
}
