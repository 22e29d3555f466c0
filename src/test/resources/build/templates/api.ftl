<#-- tries to reach the Java objects behind the model -->
table ${table.name}
${table?api.getClass().getName()}
