/**
 * The semi-discrete wall model of the whole stack as an ODE system C(T) dT/dt = f(t, T)
 * (docs/model.md), in the form the integrators take: dT/dt = f / C.
 *
 * Unknowns: node temperatures, segment by segment from the bottom (index s·n + i). The model only
 * composes: radial conduction through the mesh, the flue side of each segment
 * (physics/flue/inside.ts: the gas marching up, heat into the inner surface) and the outer boundary
 * of each segment (physics/outside/boundary.ts: convection, radiation, sun). Quadrature channels
 * (W, whole stack): heat from the gas into the wall, outside convection, outside radiation, absorbed
 * sun, and the gross exchange Σ |q| over every segment and boundary flow (in plus out, whatever the
 * direction), the scale of the energy residual.
 */
import type { OdeSystem } from '../solver/types.ts';
import type { ModelInputs } from './inputs.ts';
import { REPORTED_BOUNDARY_CHANNELS } from './timeseries.ts';
import { LINK_CONDUCTION, LINK_CONTACT, type WallMesh } from '../physics/wall/mesh.ts';
import { gapConductancePerMetre } from '../physics/wall/gap.ts';
import { evaluateDrivers, emptyDrivers, type DriverContext, type Drivers } from './drivers.ts';
import { airPropertiesAt } from '../physics/properties/air.ts';
import type { GasPropertyLookup } from '../physics/properties/flueGas.ts';
import { flueSideOfSegment, emptyFlueSide, type FlueSideSpec } from '../physics/flue/inside.ts';
import { outerBoundaryOfSegment, emptyOuterBoundary, type OuterSurfaceSpec, type OuterBoundaryOfSegment } from '../physics/outside/boundary.ts';
import { gapConvectionRatio, insideMixed, insideNaturalNusselt, insideTubeNusselt, outsideFilmCorrelations } from './correlations.ts';
import { sitePressurePa } from './site.ts';
import { PackedTables } from './packedTables.ts';

export const AUX_GAS_TO_WALL = 0;
export const AUX_CONVECTION = 1;
export const AUX_RADIATION = 2;
export const AUX_SUN = 3;
export const AUX_GROSS = 4;
export const AUX_SIZE = 5;

/** The per-segment quantities of one instant that reports and range checks need (W per metre of height, K, W/(m² K), m/s). */
export const SEGMENT_CHANNELS = [
  ...REPORTED_BOUNDARY_CHANNELS,
  'reynoldsInside',
  'prandtlInside',
  /** Outside Reynolds number on the outer diameter (NaN with a fixed film coefficient). */
  'reynoldsOutside',
  /** Outside Rayleigh number on the height (NaN with a fixed film coefficient). */
  'rayleighOutside',
  /** Outside Grashof number on the height (NaN with a fixed film coefficient). */
  'grashofOutside',
  /** Film Prandtl number outside (NaN with a fixed film coefficient). */
  'prandtlOutside',
  /** 1 where the slender-cylinder factor was applied outside, else 0. */
  'slenderOutside',
  /** Inside: the forced and natural parts of the film (W/(m² K)), 1 where buoyancy aids the flow, the lining's Rayleigh number. */
  'forcedFilmInside',
  'naturalFilmInside',
  'aidingInside',
  'rayleighNaturalInside',
  /** Inside: gas radiation as a film coefficient (W/(m² K)), gas emissivity, (p_H2O + p_CO2)·L (atm m), p_H2O/p_CO2. */
  'radiationFilmInside',
  'gasEmissivity',
  'pathLengthAtmM',
  'waterToCarbonDioxide',
] as const;

export type SegmentChannel = (typeof SEGMENT_CHANNELS)[number];

/** One Float64Array (one value per segment) per channel. */
export type SegmentDiagnostics = Record<SegmentChannel, Float64Array>;

export function makeSegmentDiagnostics(segments: number): SegmentDiagnostics {
  return Object.fromEntries(SEGMENT_CHANNELS.map((c) => [c, new Float64Array(segments)])) as SegmentDiagnostics;
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
  /** The mesh's k and c_p tables, packed; per link its k table (−1: not a conduction link), per node its c_p tables (−1: none). */
  private readonly tables = new PackedTables();
  private readonly linkTable: Int32Array;
  private readonly capTableA: Int32Array;
  private readonly capTableB: Int32Array;
  private readonly innerSink: Float64Array; // −∂q'_in/∂T_0 per segment (≥ 0)
  private readonly outerSink: Float64Array; // ∂q'_out/∂T_N per segment (≥ 0, heat leaving)
  private readonly convectionSink: Float64Array; // its convection part
  private readonly radiationSink: Float64Array; // its radiation part
  /** Per segment, W per metre of height: from the gas into the wall, convection and radiation out, sun in. */
  private readonly flueToWall: Float64Array;
  private readonly convectionOut: Float64Array;
  private readonly radiationOut: Float64Array;
  private readonly sunIn: Float64Array;
  private readonly flueSpec: FlueSideSpec;
  private readonly surfaceSpec: OuterSurfaceSpec;
  private readonly flue = emptyFlueSide();
  private readonly outer: OuterBoundaryOfSegment = emptyOuterBoundary();
  private readonly film = airPropertiesAt(300);
  private readonly outside = { airTemperatureK: 0, windSpeed: 0, skyTemperatureK: 0, groundTemperatureK: 0, sunPerMetre: 0 };
  /** Atmospheric pressure at the site, Pa (outside air, air in gaps). */
  readonly sitePressurePa: number;
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
    this.linkTable = Int32Array.from(mesh.linkMaterial, (m) => (m ? this.tables.add(m.conductivity) : -1));
    this.capTableA = Int32Array.from(mesh.capMaterialA, (m) => (m ? this.tables.add(m.specificHeat) : -1));
    this.capTableB = Int32Array.from(mesh.capMaterialB, (m) => (m ? this.tables.add(m.specificHeat) : -1));
    this.innerSink = new Float64Array(geometry.segments);
    this.outerSink = new Float64Array(geometry.segments);
    this.convectionSink = new Float64Array(geometry.segments);
    this.radiationSink = new Float64Array(geometry.segments);
    this.flueToWall = new Float64Array(geometry.segments);
    this.convectionOut = new Float64Array(geometry.segments);
    this.radiationOut = new Float64Array(geometry.segments);
    this.sunIn = new Float64Array(geometry.segments);
    const flue = inputs.flue;
    this.flueSpec = {
      innerDiameter: geometry.innerDiameter,
      segmentLength: geometry.segmentLength,
      filmCoefficient: flue.filmCoefficient,
      gasCooling: flue.gasCooling,
      nusselt: insideTubeNusselt,
      liningHeight: inputs.stack.height,
      gas,
      naturalNusselt: insideNaturalNusselt,
      mixed: insideMixed,
      radiation: flue.gasRadiation
        ? {
            waterPartialPressurePa: flue.composition.H2O * flue.pressurePa,
            carbonDioxidePartialPressurePa: flue.composition.CO2 * flue.pressurePa,
            wallEmissivity: inputs.layers[0]!.material.emissivity,
          }
        : null,
    };
    this.sitePressurePa = sitePressurePa(inputs);
    this.surfaceSpec = {
      outerDiameter: geometry.outerDiameter,
      height: inputs.stack.height,
      emissivity: inputs.surface.emissivity,
      filmCoefficient: inputs.outside.filmCoefficient,
      radiation: inputs.outside.radiation,
      filmCorrelations: outsideFilmCorrelations,
      pressurePa: this.sitePressurePa,
    };
  }

  /**
   * Conductances per metre of height of the links, and heat capacities per metre of height of the
   * nodes, of the segment whose nodes start at offset o (the mesh's arrays read once into locals:
   * this runs for every node of every segment at every evaluation).
   */
  private fillConductancesAndCapacities(y: Float64Array, o: number): void {
    const { linkKind, linkGeometry, linkGap, capMassA, capMassB } = this.mesh;
    const { conductance, capacity, tables, linkTable, capTableA, capTableB } = this;
    const n = this.n;
    const conductionLink = LINK_CONDUCTION;
    const contactLink = LINK_CONTACT;
    for (let i = 0; i < n - 1; i++) {
      const ta = y[o + i]!;
      const tb = y[o + i + 1]!;
      const kind = linkKind[i];
      conductance[i] =
        kind === conductionLink
          ? linkGeometry[i]! * tables.at(linkTable[i]!, 0.5 * (ta + tb))
          : kind === contactLink
            ? linkGeometry[i]!
            : gapConductancePerMetre(linkGap[i]!, ta, tb, gapConvectionRatio, this.sitePressurePa, this.geometry.segmentLength);
    }
    for (let i = 0; i < n; i++) {
      const t = y[o + i]!;
      const second = capTableB[i]!;
      capacity[i] = capMassA[i]! * tables.at(capTableA[i]!, t) + (second >= 0 ? capMassB[i]! * tables.at(second, t) : 0);
    }
  }

  driversAt(t: number): Drivers {
    if (this.drivers.t !== t) evaluateDrivers(this.ctx, t, this.drivers);
    return this.drivers;
  }

  /** dT/dt and the quadrature rates (whole-stack heat flows) at (t, y). */
  rhs(t: number, y: Float64Array, dydt: Float64Array, aux: Float64Array): void {
    const { geometry } = this;
    const n = this.n;
    this.boundaries(t, y, null);
    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      this.fillConductancesAndCapacities(y, o);
      const conductance = this.conductance;
      const capacity = this.capacity;
      // net conduction into each node: from the link below minus into the link above
      let fromBelow = this.flueToWall[s]!;
      for (let i = 0; i < n - 1; i++) {
        const q = conductance[i]! * (y[o + i]! - y[o + i + 1]!);
        dydt[o + i] = (fromBelow - q) / capacity[i]!;
        fromBelow = q;
      }
      dydt[o + n - 1] = (fromBelow + this.sunIn[s]! - this.convectionOut[s]! - this.radiationOut[s]!) / capacity[n - 1]!;
    }
    const dz = geometry.segmentLength;
    let qGas = 0;
    let qConv = 0;
    let qRad = 0;
    let qSun = 0;
    let qGross = 0;
    for (let s = 0; s < geometry.segments; s++) {
      qGas += this.flueToWall[s]! * dz;
      qConv += this.convectionOut[s]! * dz;
      qRad += this.radiationOut[s]! * dz;
      qSun += this.sunIn[s]! * dz;
      qGross += (Math.abs(this.flueToWall[s]!) + Math.abs(this.convectionOut[s]!) + Math.abs(this.radiationOut[s]!) + Math.abs(this.sunIn[s]!)) * dz;
    }
    aux[AUX_GAS_TO_WALL] = qGas;
    aux[AUX_CONVECTION] = qConv;
    aux[AUX_RADIATION] = qRad;
    aux[AUX_SUN] = qSun;
    aux[AUX_GROSS] = qGross;
  }

  /**
   * Flue side and outside of every segment at (t, y): heat from the gas into the inner surface
   * (marching the gas up), and convection, radiation and absorbed sun at the outer surface, each
   * per metre of height, with their derivatives for the Jacobian. With `diag`, also the
   * per-segment quantities reports need (no conduction is evaluated).
   */
  boundaries(t: number, y: Float64Array, diag: SegmentDiagnostics | null): void {
    const d = this.driversAt(t);
    const { geometry, flue, outer, outside } = this;
    const n = this.n;
    outside.airTemperatureK = d.airTemperatureK;
    outside.skyTemperatureK = d.skyTemperatureK;
    outside.groundTemperatureK = d.groundTemperatureK;
    outside.sunPerMetre = d.sunPerMetre;
    let gasIn = d.inletTemperatureK;

    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      flueSideOfSegment(this.flueSpec, gasIn, y[o]!, d.massFlow, flue);
      this.flueToWall[s] = flue.heatPerMetre;
      this.innerSink[s] = flue.sinkPerMetre;

      outside.windSpeed = d.windSpeedRef * geometry.windFactor[s]!;
      outerBoundaryOfSegment(this.surfaceSpec, y[o + n - 1]!, outside, this.film, outer);
      this.convectionOut[s] = outer.convectionPerMetre;
      this.radiationOut[s] = outer.radiationPerMetre;
      this.sunIn[s] = outer.sunPerMetre;
      this.outerSink[s] = outer.sinkPerMetre;
      this.convectionSink[s] = outer.convectionSinkPerMetre;
      this.radiationSink[s] = outer.radiationSinkPerMetre;

      if (diag) {
        diag.gasInK[s] = gasIn;
        diag.gasOutK[s] = flue.gasOutK;
        diag.insideFilm[s] = flue.filmCoefficient;
        diag.gasToWallPerMetre[s] = flue.heatPerMetre;
        diag.windAtHeight[s] = outside.windSpeed;
        diag.outsideFilm[s] = outer.filmCoefficient;
        diag.convectionPerMetre[s] = outer.convectionPerMetre;
        diag.radiationPerMetre[s] = outer.radiationPerMetre;
        diag.sunPerMetre[s] = outer.sunPerMetre;
        diag.reynoldsInside[s] = flue.reynolds;
        diag.prandtlInside[s] = flue.prandtl;
        diag.reynoldsOutside[s] = outer.reynolds;
        diag.rayleighOutside[s] = outer.rayleigh;
        diag.grashofOutside[s] = outer.grashof;
        diag.prandtlOutside[s] = outer.prandtl;
        diag.slenderOutside[s] = outer.slenderCorrected ? 1 : 0;
        diag.forcedFilmInside[s] = flue.forcedFilm;
        diag.naturalFilmInside[s] = flue.naturalFilm;
        diag.aidingInside[s] = flue.aiding;
        diag.rayleighNaturalInside[s] = flue.rayleighNatural;
        diag.radiationFilmInside[s] = flue.radiationFilm;
        diag.gasEmissivity[s] = flue.gasEmissivity;
        diag.pathLengthAtmM[s] = flue.pathLengthAtmM;
        diag.waterToCarbonDioxide[s] = flue.waterToCarbonDioxide;
      }
      gasIn = flue.gasOutK;
    }
    this.sinksT = t;
    this.sinksFingerprint = fingerprint(y);
  }

  /**
   * First-order change of the whole-stack heat flows (aux channels, W) for a change `delta` of the
   * state about the one of the last `rhs` call: the gas gives less to a warmer inner surface
   * (−innerSink δT₀), convection and radiation take more from a warmer outer surface; the sun does
   * not depend on the wall; the gross exchange changes by each flow's change with the flow's sign.
   * (The effect of a segment's wall on the gas reaching the segments above is left out, as in the
   * Jacobian.)
   */
  auxChange(delta: Float64Array, aux: Float64Array): void {
    const n = this.n;
    const dz = this.geometry.segmentLength;
    let gas = 0;
    let conv = 0;
    let rad = 0;
    let gross = 0;
    for (let s = 0; s < this.geometry.segments; s++) {
      const dGas = -this.innerSink[s]! * delta[s * n]!;
      const dOuter = delta[s * n + n - 1]!;
      const dConv = this.convectionSink[s]! * dOuter;
      const dRad = this.radiationSink[s]! * dOuter;
      gas += dGas;
      conv += dConv;
      rad += dRad;
      gross += Math.sign(this.flueToWall[s]!) * dGas + Math.sign(this.convectionOut[s]!) * dConv + Math.sign(this.radiationOut[s]!) * dRad;
    }
    aux[AUX_GAS_TO_WALL] += gas * dz;
    aux[AUX_CONVECTION] += conv * dz;
    aux[AUX_RADIATION] += rad * dz;
    aux[AUX_GROSS] += gross * dz;
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
    const { geometry } = this;
    for (let s = 0; s < geometry.segments; s++) {
      const o = s * n;
      this.fillConductancesAndCapacities(y, o);
      for (let i = 0; i < n; i++) {
        const c = this.capacity[i]!;
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
