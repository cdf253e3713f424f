// The part of autocannon 9's programmatic API the benches use (the package ships no types).
declare module "autocannon" {
  type Options = { url: string; connections?: number; duration?: number; headers?: Record<string, string>; method?: string; body?: string };
  type Histogram = { average: number; mean: number; p50: number; p90: number; p97_5: number; p99: number; max: number };
  type Result = { requests: Histogram & { total: number }; latency: Histogram; non2xx: number; errors: number; timeouts: number };
  export default function autocannon(opts: Options): Promise<Result>;
}
