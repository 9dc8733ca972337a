/**
 * The sun's beam on the sectors of a vertical cylinder: the outer surface cut into N equal
 * circumferential sectors, sector j centred on the outward azimuth φ_j (clockwise from north, like
 * the sun's azimuth). The beam falls on a surface element of outward azimuth φ at
 * G_bn cos(h) max(0, cos(φ − φ_sun)) per unit area (h the sun's altitude); diffuse sky and
 * ground-reflected light fall on every sector alike (view factor ½ each, as for the averaged wall).
 *
 * Integrated exactly over each sector's arc (not sampled at its centre), so the sectors' beam summed
 * round the circumference is G_bn cos(h) · 2 r = G_bn D cos(h) per metre: the projected-width total
 * of the circumferentially averaged model (physics/sun/irradiance.ts, absorbedSunPerMetre), for any N.
 */

const DEG = Math.PI / 180;

/** Outward azimuth of the centre of sector j of n, degrees clockwise from north: sector 0 faces north. */
export function sectorAzimuthDeg(j: number, n: number): number {
  return (360 * j) / n;
}

/**
 * ∫ max(0, cos ψ) dψ over [a, b] (radians, b − a ≤ 2π), exactly: the positive lobe is
 * ψ ∈ [−π/2, π/2] (mod 2π), where the integral is sin ψ.
 */
function positiveCosineIntegral(a: number, b: number): number {
  let total = 0;
  // the lobes centred on 2πk that can overlap [a, b]
  const kFirst = Math.floor((a + Math.PI / 2) / (2 * Math.PI)) - 1;
  const kLast = Math.ceil((b - Math.PI / 2) / (2 * Math.PI)) + 1;
  for (let k = kFirst; k <= kLast; k++) {
    const lo = Math.max(a, 2 * Math.PI * k - Math.PI / 2);
    const hi = Math.min(b, 2 * Math.PI * k + Math.PI / 2);
    if (hi > lo) total += Math.sin(hi - 2 * Math.PI * k) - Math.sin(lo - 2 * Math.PI * k);
  }
  return total;
}

/**
 * Beam irradiance on sector j of n, averaged over the sector's surface, W/m² of that surface:
 *   (1/Δφ) ∫_sector G_bn cos(h) max(0, cos(φ − φ_sun)) dφ,   Δφ = 2π/n.
 * Zero with the sun at or below the horizon. Units: W/m², degrees.
 * Example: G_bn = 800, h = 30°, n = 4, the sector facing the sun: 800 · 0.8660 · (2 sin 45°)/(π/2)
 * = 623.8 W/m²; the sector facing away: 0.
 */
export function beamOnSector(beamNormal: number, altitudeDeg: number, sunAzimuthDeg: number, j: number, n: number): number {
  if (!(altitudeDeg > 0) || !(beamNormal > 0)) return 0;
  const width = (2 * Math.PI) / n;
  const centre = (sectorAzimuthDeg(j, n) - sunAzimuthDeg) * DEG;
  return (beamNormal * Math.cos(altitudeDeg * DEG) * positiveCosineIntegral(centre - width / 2, centre + width / 2)) / width;
}
