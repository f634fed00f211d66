using Helipol.Model;
using Helipol.Pipeline;

namespace Helipol.Cli;

/// <summary>
/// Reads and resolves design files for the verbs, printing every problem of a bad file as one line each;
/// a geometry the field model would refuse is caught here, before any solve.
/// </summary>
public static class DesignLoader
{
    /// <summary>Loads all files; returns null (after printing the problems) if any is bad.</summary>
    public static IReadOnlyList<PolarizerDesign>? LoadAll(IEnumerable<string> files, CliConsole console)
    {
        var designs = new List<PolarizerDesign>();
        var bad = false;
        foreach (var file in files)
        {
            var load = DesignSource.FromFile(file, file);
            foreach (var problem in load.Problems) console.Error.WriteLine(problem.ToString());
            if (load.Design is { } design) designs.Add(design);
            else bad = true;
        }
        return bad ? null : designs;
    }
}
