// ${table.name}
<#list columns as col>
${col.name}
