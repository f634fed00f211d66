using Helipol.Spec.Fields;

namespace Helipol.Spec;

/// <summary>
/// Reads a design file into a <see cref="SpecDocument"/>: text guards, YAML tree with marks, then
/// every key checked against <see cref="DesignKeys"/>. All problems of the file are reported
/// together, first in file order first; nothing past this class sees YAML.
/// </summary>
public static class SpecReader
{
    public static SpecDocument ReadFile(string path, string? shownAs = null)
    {
        var shown = shownAs ?? path;
        var text = DesignText.Load(path, shown);
        var folder = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return ReadText(text, shown, folder);
    }

    public static SpecDocument ReadText(string text, string shownAs, string designFolder)
    {
        var context = new ReadContext(shownAs, designFolder);
        var root = YamlTreeBuilder.Build(text, shownAs, context.Errors);
        if (root is null || root is YamlScalar { IsNull: true })
            throw new DesignInputException(new SpecError(shownAs, SourceMark.FileStart, SpecError.WholeFile,
                "an empty document", "a design mapping with at least name, band, whip and polarizer"));
        DesignKeys.Root.Read(root, "", context);
        context.Errors.ThrowIfAny();
        return new SpecDocument(shownAs, designFolder, context.Values);
    }
}
