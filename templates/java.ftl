<#-- Java class with the data of a table: data private, accessors public. Layout only. -->
/*
<#list provenance as line>
 * ${line}
</#list>
 */
<#if table.javaPackage?has_content>
package ${table.javaPackage};
</#if>

/** Table ${table.name}: ${table.length} entries, ${table.format}, rounded ${table.rounding}. */
public final class ${table.className} {
    /** Number of entries in each column. */
    public static final int LENGTH = ${table.length};
<#list columns as col>

    /* ${col.description} */
    private static final ${col.javaType}[] ${col.macro} = {
<#list col.java as v>
        ${v}<#sep>,</#sep>
</#list>
    };
</#list>

    private ${table.className}() {
    }
<#list columns as col>

    /** ${col.description}. */
    public static ${col.javaType} ${col.accessor}(int i) {
        return ${col.macro}[i];
    }
</#list>
}
