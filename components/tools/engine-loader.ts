/** loads ./engine.ts once (again after a failed load, e.g. a dropped connection) */
export type CalculatorEngine = typeof import("./engine");

let loading: Promise<CalculatorEngine> | null = null;

export function loadEngine(): Promise<CalculatorEngine> {
  loading ??= import("./engine").catch((e: unknown) => {
    loading = null;
    throw e;
  });
  return loading;
}
