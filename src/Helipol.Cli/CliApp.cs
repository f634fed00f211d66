using System.CommandLine;
using Helipol.Cli.Verbs;

namespace Helipol.Cli;

/// <summary>
/// Builds the command tree and runs it. Exit codes: 0 ok, 1 runtime failure (I/O, internal),
/// 2 bad input (design file or command line). Errors are one line on stderr, never a stack trace.
/// </summary>
public static class CliApp
{
    public static int Run(string[] args) => Run(args, Console.Out, Console.Error);

    /// <summary>Runs with the given writers; tests call this in-process.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var console = new CliConsole(output, error);
        var root = new RootCommand("helipol: designs parasitic helical polarizers that make a linear whip antenna circularly polarized, and writes the files to build them.");
        root.Subcommands.Add(CheckVerb.Create(console));
        root.Subcommands.Add(SolveVerb.Create(console));
        root.Subcommands.Add(BuildVerb.Create(console));
        root.Subcommands.Add(NewVerb.Create(console));
        root.Subcommands.Add(SchemaVerb.Create(console));
        root.Subcommands.Add(AnalyzeVerb.Create(console));
        root.Subcommands.Add(SweepVerb.Create(console));
        root.Subcommands.Add(ToleranceVerb.Create(console));
        root.Subcommands.Add(CalibrateVerb.Create(console));
        root.Subcommands.Add(MismatchVerb.Create(console));

        foreach (var option in root.Options.OfType<VersionOption>())
            option.Action = new PrintVersion(output);

        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            error.WriteLine($"helipol: {parsed.Errors[0].Message} (see 'helipol --help')");
            return ExitCodes.BadInput;
        }
        try
        {
            return parsed.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (Helipol.Design.CalibrationException ex)
        {
            // A design's calibration file is input too: one line, exit 2, nothing written.
            error.WriteLine(ex.Message);
            return ExitCodes.BadInput;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"helipol: {ex.Message}");
            return ExitCodes.Failure;
        }
        catch (Exception ex)
        {
            error.WriteLine($"helipol: internal error: {ex.GetType().Name}: {ex.Message}");
            return ExitCodes.Failure;
        }
    }
}

/// <summary>Prints this program's version (not the host's, which is what a test runner would report).</summary>
internal sealed class PrintVersion(TextWriter output) : System.CommandLine.Invocation.SynchronousCommandLineAction
{
    public override int Invoke(ParseResult parseResult)
    {
        var attribute = typeof(CliApp).Assembly.GetCustomAttributes(typeof(System.Reflection.AssemblyInformationalVersionAttribute), false)
            .OfType<System.Reflection.AssemblyInformationalVersionAttribute>().FirstOrDefault();
        output.WriteLine(attribute?.InformationalVersion ?? typeof(CliApp).Assembly.GetName().Version?.ToString() ?? "unknown");
        return ExitCodes.Ok;
    }
}

public static class ExitCodes
{
    public const int Ok = 0;
    public const int Failure = 1;
    public const int BadInput = 2;
}
