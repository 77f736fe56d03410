/**
 * SQL joining the source a value or fit cites as `alias`. A duplicate source merged by an editor
 * points at the one kept (sources.merged_into_id); readers see the kept one, while the value row
 * itself keeps citing the duplicate (rows are never changed in place).
 *
 * @param sourceIdColumn SQL expression of the cited source id, e.g. `v.source_id`
 */
export function citedSourceJoin(sourceIdColumn: string, alias = 'src'): string {
  return `JOIN sources ${alias}_cited ON ${alias}_cited.id = ${sourceIdColumn}
          JOIN sources ${alias} ON ${alias}.id = coalesce(${alias}_cited.merged_into_id, ${alias}_cited.id)`;
}
