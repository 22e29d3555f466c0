<#-- reads the literal lists by index, by size and backwards, not only by listing them -->
<#assign xs = columns[0].c>
<#assign vs = columns[1].c>
<#list 0..<xs?size as i>
${xs[i]} ${vs[i]}
</#list>
<#list vs?reverse as v>${v}<#sep> </#sep></#list>
