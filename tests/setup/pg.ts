import pg from 'pg';

/**
 * PostgreSQL runs of the suites (`npm run test:postgres`): the script hands every test file the cluster's
 * URL in DATABASE_URL; each file then works in databases of its own, made here, so files running side by
 * side never see each other's rows. The cluster is thrown away afterwards, databases and all.
 */
export const CLUSTER_URL = process.env.ARCLINE_TEST_CLUSTER_URL ?? process.env.DATABASE_URL;

/** The cluster's URL with another database name. */
export function urlFor(database: string): string {
  const u = new URL(CLUSTER_URL!);
  u.pathname = `/${database}`;
  return u.toString();
}

/** Runs one statement on the cluster's maintenance database (CREATE DATABASE cannot run in a transaction). */
export async function onCluster(statement: string): Promise<void> {
  const client = new pg.Client({ connectionString: urlFor('postgres') });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}

const safeName = (s: string) => s.toLowerCase().replace(/[^a-z0-9_]/g, '_');

/** A new empty database (or a copy of `template`) with a name unique to this test file; returns its name. */
export async function createDatabase(tag: string, template?: string): Promise<string> {
  const name = safeName(`arcline_${process.pid}_${Date.now().toString(36)}_${tag}`);
  await onCluster(`create database ${name}${template ? ` template ${safeName(template)}` : ''}`);
  return name;
}
