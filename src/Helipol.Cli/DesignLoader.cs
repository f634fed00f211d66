using Helipol.Model;
using Helipol.Spec;

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
            try
            {
                var design = DesignResolver.ReadFile(file, file);
                if (DesignRefusal.LineFor(design) is { } refused)
                {
                    console.Error.WriteLine(refused);
                    bad = true;
                    continue;
                }
                designs.Add(design);
            }
            catch (DesignInputException ex)
            {
                foreach (var problem in ex.Errors) console.Error.WriteLine(problem.ToString());
                bad = true;
            }
        }
        return bad ? null : designs;
    }
}
