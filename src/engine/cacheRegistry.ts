/**
 * The registry of the engine's caches: one place that clears them all and reports what
 * they hold. This module imports nothing, so any engine module (the parser, the table,
 * thermo, references, activity) can make or register a cache here without an import cycle;
 * src/engine/cache.ts re-exports it with the table and resolution caches.
 *
 * Every cache is bounded twice: by entries and by an estimate of the bytes it holds, so a
 * few long texts cannot hold hundreds of megabytes.
 */

/** What a registered cache reports. */
export interface CacheStats {
  readonly name: string;
  readonly entries: number;
  /** Estimated bytes held (keys and values), see {@link approximateBytes}. */
  readonly bytes: number;
}

/** A cache known to the registry: it can be cleared and can say how much it holds. */
export interface RegisteredCache {
  readonly name: string;
  clear(): void;
  stats(): CacheStats;
}

const registry = new Map<string, RegisteredCache>();

/**
 * Drops everything every registered cache holds (tests, benchmarks, a host freeing memory).
 *
 * @example
 * clearRegisteredCaches(); cacheStats().every((c) => c.entries === 0) // true
 */
export function clearRegisteredCaches(): void {
  for (const c of registry.values()) c.clear();
}

/**
 * Adds a cache to the registry (a later cache of the same name replaces the earlier one).
 * Caches made with {@link ByteBoundedCache} register themselves.
 *
 * @example
 * registerCache({ name: 'myCache', clear: () => m.clear(), stats: () => ({ name: 'myCache', entries: m.size, bytes: 0 }) })
 */
export function registerCache(cache: RegisteredCache): void {
  registry.set(cache.name, cache);
}

/**
 * What every registered cache holds, by name.
 *
 * @example
 * cacheStats().find((c) => c.name === 'resolvedReactions')?.entries // 0 after clearCaches()
 */
export function cacheStats(): CacheStats[] {
  return Array.from(registry.values(), (c) => c.stats());
}

/**
 * An estimate of the memory a value holds, in bytes: strings 2 bytes a character plus a
 * header, numbers 8, bigints by their digits, objects, arrays and maps by their slots and
 * contents (each object counted once). Rough (V8 does not expose sizes) but proportional
 * to what a value holds, which is what a byte bound needs.
 *
 * @example
 * approximateBytes('abcd') // 24
 */
export function approximateBytes(value: unknown, seen: Set<object> = new Set()): number {
  switch (typeof value) {
    case 'string':
      return 16 + 2 * value.length;
    case 'number':
    case 'boolean':
    case 'undefined':
      return 8;
    case 'bigint':
      return 16 + Math.ceil(value.toString(16).length / 2);
    case 'object': {
      if (value === null) return 8;
      if (seen.has(value)) return 8;
      seen.add(value);
      let bytes = 32;
      if (value instanceof Map) {
        for (const [k, v] of value) bytes += 16 + approximateBytes(k, seen) + approximateBytes(v, seen);
        return bytes;
      }
      if (value instanceof Set) {
        for (const v of value) bytes += 8 + approximateBytes(v, seen);
        return bytes;
      }
      if (ArrayBuffer.isView(value)) return bytes + value.byteLength;
      if (value instanceof Error) {
        bytes += approximateBytes(value.message, seen) + approximateBytes(value.stack ?? '', seen);
      }
      for (const k of Object.keys(value)) {
        bytes += 8 + approximateBytes((value as Record<string, unknown>)[k], seen);
      }
      return bytes;
    }
    default:
      return 8;
  }
}

/** Limits of a {@link ByteBoundedCache}. */
export interface CacheLimits {
  /** At most this many entries. */
  readonly maxEntries: number;
  /** At most about this many bytes (keys and values, estimated). */
  readonly maxBytes: number;
  /** The size of one entry in bytes; {@link approximateBytes} of key and value by default. */
  readonly sizeOf?: (key: string, value: unknown) => number;
}

/**
 * A map from text keys with a bound on entries and on bytes: past either, the oldest
 * entries are dropped. An entry larger than the whole byte budget is not kept at all.
 * Registers itself under `name` (see {@link registerCache}).
 *
 * @example
 * const c = new ByteBoundedCache<number>('squares', { maxEntries: 100, maxBytes: 1 << 16 });
 * c.set('3', 9); c.get('3') // 9
 */
export class ByteBoundedCache<V> implements RegisteredCache {
  private readonly map = new Map<string, { value: V; bytes: number }>();
  private bytes = 0;
  private readonly sizeOf: (key: string, value: unknown) => number;

  constructor(
    readonly name: string,
    private readonly limits: CacheLimits,
  ) {
    this.sizeOf = limits.sizeOf ?? ((k, v) => 2 * k.length + 16 + approximateBytes(v));
    registerCache(this);
  }

  get(key: string): V | undefined {
    return this.map.get(key)?.value;
  }

  set(key: string, value: V): void {
    const old = this.map.get(key);
    if (old) {
      this.bytes -= old.bytes;
      this.map.delete(key);
    }
    const bytes = this.sizeOf(key, value);
    if (bytes > this.limits.maxBytes) return;
    while (
      this.map.size > 0 &&
      (this.map.size >= this.limits.maxEntries || this.bytes + bytes > this.limits.maxBytes)
    ) {
      const first = this.map.entries().next();
      if (first.done) break;
      this.bytes -= first.value[1].bytes;
      this.map.delete(first.value[0]);
    }
    this.map.set(key, { value, bytes });
    this.bytes += bytes;
  }

  clear(): void {
    this.map.clear();
    this.bytes = 0;
  }

  stats(): CacheStats {
    return { name: this.name, entries: this.map.size, bytes: this.bytes };
  }
}
