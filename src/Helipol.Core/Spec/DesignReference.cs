using System.Text;
using Helipol.Spec.Fields;

namespace Helipol.Spec;

/// <summary>The README's design-file reference table, rendered from <see cref="DesignKeys"/> (a test keeps the README in step).</summary>
public static class DesignReference
{
    public static string Markdown()
    {
        var text = new StringBuilder();
        text.Append("| key | accepts | default | meaning |\n|---|---|---|---|\n");
        foreach (var (path, field) in DesignKeys.Walk(DesignKeys.Root, ""))
        {
            var accepts = field.Type is MappingField m ? (m.AllowNone ? "none or a block" : "a block") : field.Type.Allowed;
            var fallback = field.Required ? "**required**"
                : field.Default is not null ? $"`{field.Default}`"
                : field.DefaultRule ?? (field.Type is MappingField ? "defaults of its keys" : "not set");
            text.Append($"| `{path}` | {Cell(accepts)} | {Cell(fallback)} | {Cell(field.Description)} |\n");
        }
        return text.ToString();
    }

    private static string Cell(string text) => text.Replace("|", "\\|");
}
