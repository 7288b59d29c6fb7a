/** One line of the benchmark table. Every module in scripts/bench/ exports `run(): Promise<BenchRow[]>`. */
export interface BenchRow {
  name: string;
  value: number;
  unit: string;
  /** upper bound the value must stay under, same unit */
  target?: number;
  pass?: boolean;
}
