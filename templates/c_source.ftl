<#-- C99 source with the data of a table. Layout only. -->
/*
<#list provenance as line>
 * ${line}
</#list>
 */
#include "${table.identifier}.h"
<#list columns as col>

/* ${col.description} */
const ${col.cType} ${table.identifier}_${col.name}[${table.macro}_LENGTH] = {
<#list col.c as v>
    ${v}<#sep>,</#sep>
</#list>
};
</#list>
