namespace Helipol.Spec;

/// <summary>A place in a design file: 1-based line and column, as editors count them.</summary>
public readonly record struct SourceMark(int Line, int Column)
{
    /// <summary>Used for whole-file problems (empty file, wrong encoding) and for defaults.</summary>
    public static readonly SourceMark FileStart = new(1, 1);

    public override string ToString() => $"{Line}:{Column}";
}
