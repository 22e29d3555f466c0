// ${table.name}: ${table.length} entries, ${table.format}
<#list columns as col>
pub const ${col.macro}: [f64; ${table.length}] = [<#list col.c as v>${v}<#sep>, </#sep></#list>];
</#list>
