/**
 * The semi-discrete wall model of the whole stack as an ODE system C(T) dT/dt = f(t, T)
 * (docs/model.md), in the form the integrators take: dT/dt = f / C.
 *
 * Unknowns: node temperatures, segment by segment from the bottom, sector by sector within a
 * segment (index (s·N_sec + j)·n + i; one sector: s·n + i). A (segment, sector) pair is a column of
 * n radial nodes. Every per-column quantity (capacity, radial conductance, boundary flows, sinks)
 * is stated for the whole circumference as if it were all like that sector ("full-circumference
 * equivalent", W per metre of height): the sector's own share is 1/N_sec of it, so the whole-stack
 * flows are the means over the sectors, and the conductance between two sectors enters N_sec times
 * its own value. (dT/dt is unchanged by that common scale.) The model only composes: radial conduction through the mesh, circumferential
 * conduction between neighbouring sectors (more than one sector), the flue side of each segment
 * (physics/flue/inside.ts: the gas marching up, heat into the inner surface) and the outer boundary
 * of each segment (physics/outside/boundary.ts: convection, radiation, sun). Quadrature channels
 * (W, whole stack): heat from the gas into the wall, outside convection, outside radiation, absorbed
 * sun, and the gross exchange Σ |q| over every column and boundary flow (in plus out, whatever the
 * direction), the scale of the energy residual.
 */
import type { OdeSystem } from '../solver/types.ts';
import type { ModelInputs } from './inputs.ts';
import { REPORTED_BOUNDARY_CHANNELS } from './timeseries.ts';
import { LINK_CONDUCTION, LINK_CONTACT, type WallMesh } from '../physics/wall/mesh.ts';
import { gapConductancePerMetre } from '../physics/wall/gap.ts';
import { evaluateDrivers, emptyDrivers, type DriverContext, type Drivers } from './drivers.ts';
import { airPropertiesAt, airPropertiesInto } from '../physics/properties/air.ts';
import { makeTableLookup } from '../physics/properties/table.ts';
import { circumferentialConductancePerMetre } from '../physics/wall/circumferential.ts';
import { beamOnSector } from '../physics/sun/sectors.ts';
import type { GasPropertyLookup } from '../physics/properties/flueGas.ts';
import { flueSideOfSegment, flueSideOfSectors, emptyFlueSide, type FlueSideSpec, type FlueSideOfSectors } from '../physics/flue/inside.ts';
import { outerBoundaryOfSegment, emptyOuterBoundary, type OuterSurfaceSpec, type OuterBoundaryOfSegment } from '../physics/outside/boundary.ts';
import { gapConvectionRatio, insideMixed, insideNaturalNusselt, insideTubeNusselt, outsideFilmCorrelations } from './correlations.ts';
import { sitePressurePa } from './site.ts';
import { PackedTables } from './packedTables.ts';
import { makeGreyGasExchange, meanBeamLengthLongCylinder } from '../physics/correlations/gasRadiation.ts';
import { STANDARD_PRESSURE, STEFAN_BOLTZMANN } from '../physics/constants.ts';

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

/**
 * One Float64Array per channel: one value per segment; with several sectors, `columns` holds the
 * outer-boundary channels per column (segment s, sector j at s·N_sec + j), and the segment values
 * are their sums (heat flows per metre) or means (film coefficient, dimensionless groups).
 */
export type SegmentDiagnostics = Record<SegmentChannel, Float64Array> & { readonly columns: Record<ColumnChannel, Float64Array> | null };

/** Outer-boundary channels kept per column when the wall has sectors. */
export const COLUMN_CHANNELS = ['outsideFilm', 'convectionPerMetre', 'radiationPerMetre', 'sunPerMetre', 'reynoldsOutside', 'rayleighOutside', 'grashofOutside', 'prandtlOutside', 'slenderOutside'] as const;
export type ColumnChannel = (typeof COLUMN_CHANNELS)[number];

export function makeSegmentDiagnostics(segments: number, sectors = 1): SegmentDiagnostics {
  const perSegment = Object.fromEntries(SEGMENT_CHANNELS.map((c) => [c, new Float64Array(segments)])) as Record<SegmentChannel, Float64Array>;
  const columns = sectors > 1 ? (Object.fromEntries(COLUMN_CHANNELS.map((c) => [c, new Float64Array(segments * sectors)])) as Record<ColumnChannel, Float64Array>) : null;
  return Object.assign(perSegment, { columns });
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
  /** Nodes per column. */
  readonly n: number;
  /** Circumferential sectors (1: the averaged wall). */
  readonly sectors: number;
  /** Columns: segments × sectors. */
  readonly columns: number;
  private readonly drivers: Drivers = emptyDrivers();
  private readonly conductance: Float64Array;
  private readonly capacity: Float64Array;
  /** The mesh's k and c_p tables, packed; per link its k table (−1: not a conduction link), per node its c_p tables (−1: none). */
  private readonly tables = new PackedTables();
  private readonly linkTable: Int32Array;
  private readonly capTableA: Int32Array;
  private readonly capTableB: Int32Array;
  /** Per column (W per metre of height, W/(m K)): heat from the gas, its sink −∂q′/∂T₀; convection, radiation, sun at the outer surface, and the sinks ∂q′/∂T_N. */
  private readonly innerSink: Float64Array;
  private readonly convectionSink: Float64Array;
  private readonly radiationSink: Float64Array;
  private readonly flueToWall: Float64Array;
  private readonly convectionOut: Float64Array;
  private readonly radiationOut: Float64Array;
  private readonly sunIn: Float64Array;
  private readonly flueSpec: FlueSideSpec;
  private readonly surfaceSpec: OuterSurfaceSpec;
  private readonly flue = emptyFlueSide();
  private readonly flueSectors: FlueSideOfSectors;
  private readonly outer: OuterBoundaryOfSegment = emptyOuterBoundary();
  private readonly film = airPropertiesAt(300);
  private readonly outside = { airTemperatureK: 0, windSpeed: 0, skyTemperatureK: 0, groundTemperatureK: 0, sunPerMetre: 0 };
  /** Sector models: every node's capacity (rhs), the circumferential links and their conductances. */
  private readonly capacityAll: Float64Array;
  private readonly circumferential: CircumferentialLinks | null;
  /** Scratch of the Jacobian: each circumferential link's conductance (sectors only). */
  private readonly pairConductance: Float64Array;
  /** Atmospheric pressure at the site, Pa (outside air, air in gaps). */
  readonly sitePressurePa: number;

  constructor(
    readonly inputs: ModelInputs,
    readonly mesh: WallMesh,
    readonly geometry: StackGeometry,
    readonly ctx: DriverContext,
    readonly gas: GasPropertyLookup,
  ) {
    this.n = mesh.nodeCount;
    this.sectors = inputs.stack.sectors ?? 1;
    this.columns = geometry.segments * this.sectors;
    this.size = this.n * this.columns;
    this.conductance = new Float64Array(Math.max(1, this.n - 1));
    this.capacity = new Float64Array(this.n);
    this.linkTable = Int32Array.from(mesh.linkMaterial, (m) => (m ? this.tables.add(m.conductivity) : -1));
    this.capTableA = Int32Array.from(mesh.capMaterialA, (m) => (m ? this.tables.add(m.specificHeat) : -1));
    this.capTableB = Int32Array.from(mesh.capMaterialB, (m) => (m ? this.tables.add(m.specificHeat) : -1));
    const perColumn = () => new Float64Array(this.columns);
    this.innerSink = perColumn();
    this.convectionSink = perColumn();
    this.radiationSink = perColumn();
    this.flueToWall = perColumn();
    this.convectionOut = perColumn();
    this.radiationOut = perColumn();
    this.sunIn = perColumn();
    this.flueSectors = { heatPerMetre: new Float64Array(this.sectors), sinkPerMetre: new Float64Array(this.sectors) };
    this.capacityAll = new Float64Array(this.sectors > 1 ? this.size : 0);
    this.circumferential = this.sectors > 1 ? circumferentialLinks(mesh, this.sectors) : null;
    this.pairConductance = new Float64Array(this.sectors > 1 ? this.size : 0);
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
        ? makeGreyGasExchange(flue.composition.H2O * flue.pressurePa, flue.composition.CO2 * flue.pressurePa, meanBeamLengthLongCylinder(geometry.innerDiameter), inputs.layers[0]!.material.emissivity)
        : null,
      radiationRatio: flue.composition.CO2 > 0 ? flue.composition.H2O / flue.composition.CO2 : Infinity,
      radiationPathLengthAtmM: ((flue.composition.H2O + flue.composition.CO2) * flue.pressurePa * meanBeamLengthLongCylinder(geometry.innerDiameter)) / STANDARD_PRESSURE,
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
   * nodes (into `capacity` from index `co`), of the column whose nodes start at offset o (the mesh's arrays read
   * once into locals: this runs for every node of every column at every evaluation).
   */
  private fillConductancesAndCapacities(y: Float64Array, o: number, capacity: Float64Array, co: number): void {
    const { linkKind, linkGeometry, linkGap, capMassA, capMassB } = this.mesh;
    const { conductance, tables, linkTable, capTableA, capTableB } = this;
    const n = this.n;
    for (let i = 0; i < n - 1; i++) {
      const tIn = y[o + i]!;
      const tOut = y[o + i + 1]!;
      const kind = linkKind[i];
      conductance[i] =
        kind === LINK_CONDUCTION
          ? linkGeometry[i]! * tables.at(linkTable[i]!, 0.5 * (tIn + tOut))
          : kind === LINK_CONTACT
            ? linkGeometry[i]!
            : gapConductancePerMetre(linkGap[i]!, tIn, tOut, gapConvectionRatio, this.sitePressurePa, this.geometry.segmentLength);
    }
    for (let i = 0; i < n; i++) {
      const t = y[o + i]!;
      const second = capTableB[i]!;
      capacity[co + i] = capMassA[i]! * tables.at(capTableA[i]!, t) + (second >= 0 ? capMassB[i]! * tables.at(second, t) : 0);
    }
  }

  driversAt(t: number): Drivers {
    if (this.drivers.t !== t) evaluateDrivers(this.ctx, t, this.drivers);
    return this.drivers;
  }

  /** dT/dt and the quadrature rates (whole-stack heat flows) at (t, y). */
  rhs(t: number, y: Float64Array, dydt: Float64Array, aux: Float64Array): void {
    const n = this.n;
    const several = this.sectors > 1;
    this.boundaries(t, y, null);
    const conductance = this.conductance;
    for (let col = 0; col < this.columns; col++) {
      const o = col * n;
      const capacity = several ? this.capacityAll : this.capacity;
      const co = several ? o : 0;
      this.fillConductancesAndCapacities(y, o, capacity, co);
      // net conduction into each node: from the link below minus into the link above (divided by
      // the capacity here for one sector; with several, after the circumferential flows are added)
      let fromBelow = this.flueToWall[col]!;
      for (let i = 0; i < n - 1; i++) {
        const q = conductance[i]! * (y[o + i]! - y[o + i + 1]!);
        dydt[o + i] = several ? fromBelow - q : (fromBelow - q) / capacity[i]!;
        fromBelow = q;
      }
      const last = fromBelow + this.sunIn[col]! - this.convectionOut[col]! - this.radiationOut[col]!;
      dydt[o + n - 1] = several ? last : last / capacity[n - 1]!;
    }
    if (several) {
      this.circumferentialFlows(y, dydt);
      for (let k = 0; k < this.size; k++) dydt[k] /= this.capacityAll[k]!;
    }
    const dz = this.geometry.segmentLength;
    let qGas = 0;
    let qConv = 0;
    let qRad = 0;
    let qSun = 0;
    let qGross = 0;
    for (let col = 0; col < this.columns; col++) {
      qGas += this.flueToWall[col]! * dz;
      qConv += this.convectionOut[col]! * dz;
      qRad += this.radiationOut[col]! * dz;
      qSun += this.sunIn[col]! * dz;
      qGross += (Math.abs(this.flueToWall[col]!) + Math.abs(this.convectionOut[col]!) + Math.abs(this.radiationOut[col]!) + Math.abs(this.sunIn[col]!)) * dz;
    }
    // per-column flows are full-circumference equivalents (see the module comment)
    const share = 1 / this.sectors;
    aux[AUX_GAS_TO_WALL] = several ? qGas * share : qGas;
    aux[AUX_CONVECTION] = several ? qConv * share : qConv;
    aux[AUX_RADIATION] = several ? qRad * share : qRad;
    aux[AUX_SUN] = several ? qSun * share : qSun;
    aux[AUX_GROSS] = several ? qGross * share : qGross;
  }

  /** Heat round the circumference between neighbouring sectors, added to the node balances in `dydt` (W/m). */
  private circumferentialFlows(y: Float64Array, dydt: Float64Array): void {
    const links = this.circumferential!;
    const n = this.n;
    const ns = this.sectors;
    for (let s = 0; s < this.geometry.segments; s++) {
      for (let j = 0; j < ns; j++) {
        const a = (s * ns + j) * n;
        const b = (s * ns + ((j + 1) % ns)) * n;
        for (let i = 0; i < n; i++) {
          const q = ns * links.conductance(i, 0.5 * (y[a + i]! + y[b + i]!)) * (y[a + i]! - y[b + i]!);
          dydt[a + i] -= q;
          dydt[b + i] += q;
        }
      }
    }
  }

  /**
   * Flue side and outside of every column at (t, y): heat from the gas into the inner surfaces
   * (marching the gas up), and convection, radiation and absorbed sun at the outer surfaces, each
   * per metre of height, with their derivatives for the Jacobian. With `diag`, also the quantities
   * reports need (no conduction is evaluated).
   */
  boundaries(t: number, y: Float64Array, diag: SegmentDiagnostics | null): void {
    const d = this.driversAt(t);
    const { geometry, flue, outer, outside } = this;
    const n = this.n;
    const ns = this.sectors;
    outside.airTemperatureK = d.airTemperatureK;
    outside.skyTemperatureK = d.skyTemperatureK;
    outside.groundTemperatureK = d.groundTemperatureK;
    let gasIn = d.inletTemperatureK;

    for (let s = 0; s < geometry.segments; s++) {
      if (ns === 1) {
        flueSideOfSegment(this.flueSpec, gasIn, y[s * n]!, d.massFlow, flue);
        this.flueToWall[s] = flue.heatPerMetre;
        this.innerSink[s] = flue.sinkPerMetre;
      } else {
        flueSideOfSectors(this.flueSpec, gasIn, y, s * ns * n, n, ns, d.massFlow, flue, this.flueSectors, diag !== null);
        for (let j = 0; j < ns; j++) {
          this.flueToWall[s * ns + j] = ns * this.flueSectors.heatPerMetre[j]!;
          this.innerSink[s * ns + j] = ns * this.flueSectors.sinkPerMetre[j]!;
        }
      }

      outside.windSpeed = d.windSpeedRef * geometry.windFactor[s]!;
      for (let j = 0; j < ns; j++) {
        const col = s * ns + j;
        outside.sunPerMetre = ns === 1 ? d.sunPerMetre : this.inputs.outside.sun ? ns * sunOnSector(d, this.inputs.surface.solarAbsorptance, geometry.outerDiameter, j, ns) : 0;
        outerBoundaryOfSegment(this.surfaceSpec, y[col * n + n - 1]!, outside, this.film, outer);
        this.convectionOut[col] = outer.convectionPerMetre;
        this.radiationOut[col] = outer.radiationPerMetre;
        this.sunIn[col] = outer.sunPerMetre;
        this.convectionSink[col] = outer.convectionSinkPerMetre;
        this.radiationSink[col] = outer.radiationSinkPerMetre;
        if (diag?.columns) {
          const c = diag.columns;
          c.outsideFilm[col] = outer.filmCoefficient;
          c.convectionPerMetre[col] = outer.convectionPerMetre;
          c.radiationPerMetre[col] = outer.radiationPerMetre;
          c.sunPerMetre[col] = outer.sunPerMetre;
          c.reynoldsOutside[col] = outer.reynolds;
          c.rayleighOutside[col] = outer.rayleigh;
          c.grashofOutside[col] = outer.grashof;
          c.prandtlOutside[col] = outer.prandtl;
          c.slenderOutside[col] = outer.slenderCorrected ? 1 : 0;
        }
      }

      if (diag) {
        diag.gasInK[s] = gasIn;
        diag.gasOutK[s] = flue.gasOutK;
        diag.insideFilm[s] = flue.filmCoefficient;
        diag.gasToWallPerMetre[s] = flue.heatPerMetre;
        diag.windAtHeight[s] = outside.windSpeed;
        diag.reynoldsInside[s] = flue.reynolds;
        diag.prandtlInside[s] = flue.prandtl;
        diag.forcedFilmInside[s] = flue.forcedFilm;
        diag.naturalFilmInside[s] = flue.naturalFilm;
        diag.aidingInside[s] = flue.aiding;
        diag.rayleighNaturalInside[s] = flue.rayleighNatural;
        diag.radiationFilmInside[s] = flue.radiationFilm;
        diag.gasEmissivity[s] = flue.gasEmissivity;
        diag.pathLengthAtmM[s] = flue.pathLengthAtmM;
        diag.waterToCarbonDioxide[s] = flue.waterToCarbonDioxide;
        if (ns === 1) {
          diag.outsideFilm[s] = outer.filmCoefficient;
          diag.convectionPerMetre[s] = outer.convectionPerMetre;
          diag.radiationPerMetre[s] = outer.radiationPerMetre;
          diag.sunPerMetre[s] = outer.sunPerMetre;
          diag.reynoldsOutside[s] = outer.reynolds;
          diag.rayleighOutside[s] = outer.rayleigh;
          diag.grashofOutside[s] = outer.grashof;
          diag.prandtlOutside[s] = outer.prandtl;
          diag.slenderOutside[s] = outer.slenderCorrected ? 1 : 0;
        } else {
          // the segment's values: circumferential means (for the heat flows, full-circumference
          // equivalents averaged over the sectors are the segment's totals per metre)
          const c = diag.columns!;
          const mean = (a: Float64Array) => {
            let v = 0;
            for (let j = 0; j < ns; j++) v += a[s * ns + j]!;
            return v / ns;
          };
          diag.outsideFilm[s] = mean(c.outsideFilm);
          diag.convectionPerMetre[s] = mean(c.convectionPerMetre);
          diag.radiationPerMetre[s] = mean(c.radiationPerMetre);
          diag.sunPerMetre[s] = mean(c.sunPerMetre);
          diag.reynoldsOutside[s] = c.reynoldsOutside[s * ns]!;
          diag.rayleighOutside[s] = mean(c.rayleighOutside);
          diag.grashofOutside[s] = mean(c.grashofOutside);
          diag.prandtlOutside[s] = mean(c.prandtlOutside);
          diag.slenderOutside[s] = mean(c.slenderOutside) > 0 ? 1 : 0;
        }
      }
      gasIn = flue.gasOutK;
    }
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
    for (let col = 0; col < this.columns; col++) {
      const dGas = -this.innerSink[col]! * delta[col * n]!;
      const dOuter = delta[col * n + n - 1]!;
      const dConv = this.convectionSink[col]! * dOuter;
      const dRad = this.radiationSink[col]! * dOuter;
      gas += dGas;
      conv += dConv;
      rad += dRad;
      gross += Math.sign(this.flueToWall[col]!) * dGas + Math.sign(this.convectionOut[col]!) * dConv + Math.sign(this.radiationOut[col]!) * dRad;
    }
    const share = this.sectors > 1 ? dz / this.sectors : dz;
    aux[AUX_GAS_TO_WALL] += gas * share;
    aux[AUX_CONVECTION] += conv * share;
    aux[AUX_RADIATION] += rad * share;
    aux[AUX_GROSS] += gross * share;
  }

  /**
   * Tridiagonal Jacobian of dT/dt: radial conduction with conductances frozen at the current state,
   * the local flue-side and outside sinks on the surface nodes. Left out (they only slow Newton a
   * little, never change the answer): the dependence of a segment's inlet gas temperature on the
   * walls below, and the couplings between neighbouring sectors, whose conductances stay on the
   * diagonal (they are small next to the radial ones: Δr ≪ r Δφ).
   */
  jacobian(t: number, y: Float64Array, lower: Float64Array, diag: Float64Array, upper: Float64Array): void {
    // the surface sinks at this state (a few Jacobians a day: recomputed rather than remembered)
    const n = this.n;
    this.boundaries(t, y, null);
    const links = this.circumferential;
    const capacity = this.capacity;
    const ns = this.sectors;
    // each circumferential link once: towards[col·n + i] joins node i of a column to its neighbour on the right
    const towards = this.pairConductance;
    if (links)
      for (let col = 0; col < this.columns; col++) {
        const o = col * n;
        const right = (col - (col % ns) + ((col % ns) + 1) % ns) * n;
        for (let i = 0; i < n; i++) towards[o + i] = links.conductance(i, 0.5 * (y[o + i]! + y[right + i]!));
      }
    for (let col = 0; col < this.columns; col++) {
      const o = col * n;
      this.fillConductancesAndCapacities(y, o, capacity, 0);
      // the link from the left is its left neighbour's link to the right
      const left = links ? (col - (col % ns) + ((col % ns) + ns - 1) % ns) * n : 0;
      for (let i = 0; i < n; i++) {
        const c = capacity[i]!;
        const gl = i > 0 ? this.conductance[i - 1]! : 0;
        const gu = i < n - 1 ? this.conductance[i]! : 0;
        let dd = -(gl + gu);
        if (i === 0) dd -= this.innerSink[col]!;
        if (i === n - 1) dd -= this.convectionSink[col]! + this.radiationSink[col]!;
        if (links) dd -= ns * (towards[left + i]! + towards[o + i]!);
        lower[o + i] = i > 0 ? gl / c : 0;
        upper[o + i] = i < n - 1 ? gu / c : 0;
        diag[o + i] = dd / c;
      }
    }
  }
}

/**
 * Sun absorbed by sector j of n, W per metre of height: its beam (exact over the sector's arc,
 * physics/sun/sectors.ts) and its share of the diffuse and ground-reflected light, which fall on
 * every side alike. Summed over the sectors: the averaged wall's total.
 */
function sunOnSector(d: Drivers, solarAbsorptance: number, outerDiameter: number, j: number, n: number): number {
  const beam = beamOnSector(d.beamNormal, d.sunAltitudeDeg, d.sunAzimuthDeg, j, n);
  return (solarAbsorptance * beam * Math.PI * outerDiameter) / n + d.sunDiffusePerMetre / n;
}

/** Circumferential conductance of each radial node between two neighbouring sectors, W/(m K), at a temperature. */
interface CircumferentialLinks {
  conductance(node: number, temperatureK: number): number;
}

/**
 * The links round the circumference of a mesh cut into n sectors: each node's control volume
 * conducts over the arc r Δφ (physics/wall/circumferential.ts) with the conductivity of each of its
 * materials; the face nodes of an air gap also carry half the gap, as still air plus a radiative
 * conductivity 4 σ T³ w / (1/ε₁ + 1/ε₂ − 1) (the equivalent conductivity of a cavity, used here as
 * an estimate of the radiation along a narrow gap).
 */
function circumferentialLinks(mesh: WallMesh, sectors: number): CircumferentialLinks {
  const dphi = (2 * Math.PI) / sectors;
  const kA = mesh.capMaterialA.map((m) => (m ? makeTableLookup(m.conductivity) : null));
  const kB = mesh.capMaterialB.map((m) => (m ? makeTableLookup(m.conductivity) : null));
  const air = airPropertiesAt(300);
  return {
    conductance(i, t) {
      const r = mesh.radius[i]!;
      let kw = 0;
      const a = kA[i];
      const b = kB[i];
      if (a) kw += a(t) * mesh.radialExtentA[i]!;
      if (b) kw += b(t) * mesh.radialExtentB[i]!;
      const gap = mesh.gapWidthAtNode[i]!;
      if (gap > 0) kw += 0.5 * gap * (airPropertiesInto(air, t).conductivity + 4 * STEFAN_BOLTZMANN * t * t * t * gap * mesh.gapRadiationFactorAtNode[i]!);
      return circumferentialConductancePerMetre(kw, 1, r, dphi);
    },
  };
}
