import type { SWRConfiguration } from "swr";

/**
 * SWR options for data the server page already loaded: while the hook's key is still the one the
 * page rendered, the page's data is the hook's `fallbackData` and the hook does not fetch it again
 * on mount. Any other key (a new filter, a new page) fetches as usual.
 */
export function serverFirst<T>(key: string | null, initial: { key: string; data: T } | undefined): SWRConfiguration<T> {
  if (!initial || key !== initial.key) return {};
  return { fallbackData: initial.data, revalidateOnMount: false };
}

/** What the API would have sent: the same value after a JSON round trip (dates become ISO strings). */
export const asJson = <T>(value: unknown): T => JSON.parse(JSON.stringify(value)) as T;
