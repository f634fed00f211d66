using Helipol.Design;
using Helipol.Model;
using Helipol.Pipeline;
using Spectre.Console;

namespace Helipol.Cli;

/// <summary>Shared by solve, sweep, tolerance and build: solves a design with a progress line on an interactive terminal.</summary>
public static class SolveRunner
{
    /// <summary>Solves, or throws <see cref="DesignRefusedException"/> with one line when the design cannot be solved.</summary>
    public static SolvedPolarizer Solve(CliConsole console, PolarizerDesign design, FieldSolveCounter counter) =>
        WithStatus(console, design, progress => DesignPipeline.Solve(design, counter, progress));

    /// <summary>Runs <paramref name="work"/> under a "solving" status line on an interactive terminal, fed by its progress.</summary>
    public static T WithStatus<T>(CliConsole console, PolarizerDesign design, Func<IProgress<string>?, T> work)
    {
        if (!console.Tables.Profile.Capabilities.Interactive) return work(null);
        T result = default!;
        console.Tables.Status().Start($"solving {design.Name}", ctx =>
        {
            result = work(new Progress<string>(s => ctx.Status(Markup.Escape(s))));
        });
        return result;
    }
}
