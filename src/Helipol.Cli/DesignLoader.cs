using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli;

/// <summary>Reads and resolves design files for the verbs, printing every problem of a bad file as one line each.</summary>
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
                designs.Add(DesignResolver.ReadFile(file, file));
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
