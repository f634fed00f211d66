using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Pipeline;

/// <summary>A design read from text: the design, or every problem found (in file order) and no design.</summary>
public sealed record DesignLoad(PolarizerDesign? Design, IReadOnlyList<SpecError> Problems)
{
    public bool Ok => Design is not null;
}

/// <summary>
/// Reads a design (YAML) through the Spec reader and the Model resolver, then the pre-solve guard,
/// so a caller gets a design the solver can work on or the one-line problems a user would see.
/// </summary>
public static class DesignSource
{
    /// <param name="shownAs">the name error lines start with (the path as the user wrote it)</param>
    public static DesignLoad FromFile(string path, string? shownAs = null) =>
        Load(() => SpecReader.ReadFile(path, shownAs ?? path));

    /// <param name="designFolder">the folder relative paths in the design (a calibration file) are taken from</param>
    public static DesignLoad FromText(string yaml, string shownAs, string designFolder) =>
        Load(() => SpecReader.ReadText(yaml, shownAs, designFolder));

    private static DesignLoad Load(Func<SpecDocument> read)
    {
        try
        {
            var doc = read();
            var design = DesignResolver.Resolve(doc);
            return DesignRefusal.ErrorFor(design, doc) is { } refused ? new(null, [refused]) : new(design, []);
        }
        catch (DesignInputException ex)
        {
            return new(null, ex.Errors);
        }
    }
}
