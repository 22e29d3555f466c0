<#-- C99 header of a table. Layout only: every literal comes formatted from odetab. -->
/*
<#list provenance as line>
 * ${line}
</#list>
 */
#ifndef ODETAB_${table.macro}_H
#define ODETAB_${table.macro}_H

#include <stdint.h>

#ifdef __cplusplus
extern "C" {
#endif

/* Number of entries in each array of this table. */
#define ${table.macro}_LENGTH ${table.length}
<#if grid.uniform>

/* Grid: ${grid.description}. */
#define ${table.macro}_X_FROM ${grid.from.binary64} /* ${grid.from.exact}<#if !grid.from.isExact>, rounded to nearest</#if> */
#define ${table.macro}_X_TO ${grid.to.binary64} /* ${grid.to.exact}<#if !grid.to.isExact>, rounded to nearest</#if> */
#define ${table.macro}_X_STEP ${grid.step.binary64} /* ${grid.step.exact}<#if !grid.step.isExact>, rounded to nearest</#if> */
</#if>
<#list columns as col>

/* ${col.description} */
extern const ${col.cType} ${table.identifier}_${col.name}[${table.macro}_LENGTH];
</#list>

#ifdef __cplusplus
}
#endif

#endif /* ODETAB_${table.macro}_H */
