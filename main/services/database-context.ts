import type Database from 'better-sqlite3';
import { describeWriteFailure } from '../storage/storage-error.js';

/** The open database a service works on, with the path used in error messages. */
export interface DatabaseContext {
  readonly db: Database.Database;
  readonly path: string;
}

/**
 * Runs `work` as one IMMEDIATE transaction: the write lock is taken at the start, so a writer in
 * another process makes this one wait (busy_timeout) instead of failing half-way; either all of
 * `work` is saved or none of it. SQLite failures become StorageErrors with a clear sentence.
 */
export function inWriteTransaction<T>(context: DatabaseContext, work: () => T): T {
  try {
    return context.db.transaction(work).immediate();
  } catch (error) {
    throw describeWriteFailure(error, context.path);
  }
}

export function nowIso(): string {
  return new Date().toISOString();
}
