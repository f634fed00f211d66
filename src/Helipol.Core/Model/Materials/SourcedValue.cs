namespace Helipol.Model.Materials;

/// <summary>A material property with where the number comes from (a book, a paper, "from memory", or the design file).</summary>
public sealed record SourcedValue(double Value, string Source)
{
    public const string DesignFile = "design file override";
}
