/**
 * Works around a known incompatibility of Sequelize 6's mariadb dialect with mariadb driver 3.1+
 * (sequelize/sequelize#15701, mariadb-corporation/mariadb-connector-nodejs#234): the driver
 * attaches `meta` to result arrays as a non-configurable property, and the dialect's raw-query
 * path deletes it, which throws "Cannot delete property 'meta' of [object Array]" in strict mode.
 * Every untyped `sequelize.query(...)` (health checks, information_schema reads) and some
 * queryInterface calls (removeColumn, removeIndex) take that path.
 *
 * The fix hands the dialect a copy of the array whose `meta` may be deleted; rows are untouched.
 */
import type { Sequelize } from 'sequelize';

type FormatResults = (this: unknown, data: unknown, ...rest: unknown[]) => unknown;
const patched = new WeakSet<object>();

function withDeletableMeta(data: unknown): unknown {
  if (!Array.isArray(data)) return data;
  const descriptor = Object.getOwnPropertyDescriptor(data, 'meta');
  if (!descriptor || descriptor.configurable) return data;
  const copy = data.slice();
  Object.defineProperty(copy, 'meta', { value: descriptor.value, writable: true, configurable: true, enumerable: false });
  return copy;
}

export function applyMariadbRawQueryFix(sequelize: Sequelize): void {
  const dialect = (sequelize as unknown as { dialect?: { Query?: { prototype: { formatResults?: FormatResults } } } }).dialect;
  const proto = dialect?.Query?.prototype;
  if (!proto?.formatResults || patched.has(proto)) return;
  const original = proto.formatResults;
  proto.formatResults = function formatResults(this: unknown, data: unknown, ...rest: unknown[]) {
    return original.call(this, withDeletableMeta(data), ...rest);
  };
  patched.add(proto);
}
