import { gunzipSync } from 'node:zlib';
import type { KyselyPlugin, PluginTransformQueryArgs, PluginTransformResultArgs, QueryResult, RootOperationNode, UnknownRow } from 'kysely';

/**
 * Result columns stored as JSON text (the JSONColumnType<> columns in db/schema.ts). Add a new JSON column
 * here; tests/unit/json-columns.test.ts fails if schema.ts has one that is missing.
 */
export const JSON_COLUMNS: ReadonlySet<string> = new Set(['document', 'spec', 'detail', 'details', 'figures', 'checks']);

/**
 * Parses exactly the JSON columns, once. Kysely's ParseJSONResultsPlugin instead parses every string that
 * looks like JSON, at any depth: a scene titled "[1, 2]" came back as an array, and a note inside a
 * document reading {"a":1} came back as an object, so saved data did not round-trip.
 */
export class JsonColumnsPlugin implements KyselyPlugin {
  transformQuery(args: PluginTransformQueryArgs): RootOperationNode {
    return args.node;
  }

  async transformResult(args: PluginTransformResultArgs): Promise<QueryResult<UnknownRow>> {
    for (const row of args.result.rows) {
      for (const key of Object.keys(row)) {
        const v = row[key];
        if (!JSON_COLUMNS.has(key)) continue;
        if (typeof v === 'string') row[key] = JSON.parse(v);
        // A compressed snapshot (an autosave revision: db/repositories/revision-storage.ts) comes back as
        // gzip bytes; on PostgreSQL a kept revision comes back as the UTF-8 bytes of its JSON.
        else if (v instanceof Uint8Array) row[key] = JSON.parse((isGzip(v) ? gunzipSync(v) : Buffer.from(v.buffer, v.byteOffset, v.byteLength)).toString('utf8'));
        // PostgreSQL's json columns arrive already parsed by the driver: nothing to do.

      }
    }
    return args.result;
  }
}

/** gzip's two magic bytes; JSON text never starts with 0x1f. */
function isGzip(v: Uint8Array): boolean {
  return v.length >= 2 && v[0] === 0x1f && v[1] === 0x8b;
}
