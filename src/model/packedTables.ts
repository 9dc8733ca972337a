/**
 * The property tables of a wall mesh packed into flat typed arrays, read by one monomorphic method
 * on the hot path (every link and node of every segment at every evaluation). Same values as
 * physics/properties/table.ts: linear between points, constant beyond the ends.
 */
import type { PropertyTable } from '../physics/properties/table.ts';

export class PackedTables {
  private temperature = new Float64Array(0);
  private value = new Float64Array(0);
  private slope = new Float64Array(0);
  private readonly start: number[] = [];
  private readonly count: number[] = [];
  private readonly known = new Map<PropertyTable, number>();

  /** Index of `table` (added once; the same table object gives the same index). */
  add(table: PropertyTable): number {
    const seen = this.known.get(table);
    if (seen !== undefined) return seen;
    const n = table.temperatureK.length;
    const offset = this.temperature.length;
    const grow = (a: Float64Array) => {
      const b = new Float64Array(offset + n);
      b.set(a);
      return b;
    };
    this.temperature = grow(this.temperature);
    this.value = grow(this.value);
    this.slope = grow(this.slope);
    for (let i = 0; i < n; i++) {
      this.temperature[offset + i] = table.temperatureK[i]!;
      this.value[offset + i] = table.values[i]!;
      this.slope[offset + i] = i + 1 < n ? (table.values[i + 1]! - table.values[i]!) / (table.temperatureK[i + 1]! - table.temperatureK[i]!) : 0;
    }
    const index = this.start.length;
    this.start.push(offset);
    this.count.push(n);
    this.known.set(table, index);
    return index;
  }

  /** Table `index` at temperature T (K); NaN for a NaN temperature. */
  at(index: number, temperatureK: number): number {
    const t = this.temperature;
    const first = this.start[index]!;
    const last = first + this.count[index]! - 1;
    if (temperatureK <= t[first]!) return this.value[first]!;
    if (temperatureK >= t[last]!) return this.value[last]!;
    let i = first;
    while (temperatureK >= t[i + 1]!) i++;
    return this.value[i]! + this.slope[i]! * (temperatureK - t[i]!);
  }
}
