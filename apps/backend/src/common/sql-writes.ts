import { EventEmitter } from 'node:events';

/**
 * Writes made with plain SQL (the reading writer) bypass MikroORM's flush events; they are
 * announced here, by entity name, so the caches that watch those entities drop their
 * results just as they do for a flush.
 */
const writes = new EventEmitter();
writes.setMaxListeners(0);

export function announceSqlWrite(entityNames: readonly string[]): void {
  writes.emit('write', entityNames);
}

export function onSqlWrite(listener: (entityNames: readonly string[]) => void): () => void {
  writes.on('write', listener);
  return () => writes.off('write', listener);
}
