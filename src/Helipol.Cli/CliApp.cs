using System.CommandLine;
using Helipol.Cli.Verbs;
using Helipol.Pipeline;
using Helipol.Spec;

namespace Helipol.Cli;

/// <summary>
/// Builds the command tree and runs it. Exit codes: 0 ok, 1 runtime failure (I/O, internal),
/// 2 bad input (design file or command line). Errors are one line on stderr, never a stack trace
/// (unless HELIPOL_DEBUG=1, which adds it after the line for a developer).
/// HELIPOL_THREADS=N caps every parallel loop at N worker threads; outputs are the same bits for any N.
/// </summary>
public static class CliApp
{
    /// <summary>Cap on worker threads (a positive integer); unset means one per processor.</summary>
    public const string ThreadsVariable = "HELIPOL_THREADS";

    /// <summary>Set to 1 to print the stack trace of an unexpected failure after its one line.</summary>
    public const string DebugVariable = "HELIPOL_DEBUG";

    public static int Run(string[] args) => Run(args, Console.Out, Console.Error);

    /// <summary>Runs with the given writers; tests call this in-process.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var threads = Environment.GetEnvironmentVariable(ThreadsVariable);
        if (!string.IsNullOrEmpty(threads))
        {
            if (!int.TryParse(threads, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var n) || n < 1)
            {
                error.WriteLine($"helipol: {ThreadsVariable}: found '{threads}', allowed a whole number of threads ≥ 1");
                return ExitCodes.BadInput;
            }
            Helipol.Engine.Parallelism.MaxDegree = n;
        }
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

        // No response files: every word is what it says, so a design named '@x.yaml' is a file name.
        var parsed = root.Parse(args, new ParserConfiguration { ResponseFileTokenReplacer = null });
        // Any command line that cannot run, in the project's one-line form (never the parser's text).
        if (CommandLineErrors.Describe(root, parsed) is { } problem)
        {
            error.WriteLine(problem);
            return ExitCodes.BadInput;
        }
        try
        {
            return parsed.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (DesignRefusedException ex)
        {
            error.WriteLine(ex.Message);
            return ExitCodes.BadInput;
        }
        catch (DesignInputException ex)
        {
            // A design refused by the checker wherever it surfaces: its first problem, one line.
            error.WriteLine(ex.Errors[0].ToString());
            return ExitCodes.BadInput;
        }
        catch (Helipol.Engine.ModelException ex)
        {
            // A geometry the field model refuses after the guards (e.g. at the top of a sweep) is
            // still a property of the design, not of the machine.
            error.WriteLine($"helipol: found a geometry the field model refuses ({OneLine(ex.Message)}), allowed wires that do not touch and are thin enough");
            return ExitCodes.BadInput;
        }
        catch (Helipol.Design.CalibrationException ex)
        {
            // A design's calibration file is input too: one line, exit 2, nothing written.
            error.WriteLine(ex.Message);
            return ExitCodes.BadInput;
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"helipol: {OneLine(ex.Message)}");
            Debug(error, ex);
            return ExitCodes.Failure;
        }
        catch (Exception ex)
        {
            // No .NET type name on the user's line; HELIPOL_DEBUG=1 adds the exception with its trace.
            error.WriteLine($"helipol: internal error: {OneLine(ex.Message)} (HELIPOL_DEBUG=1 shows where)");
            Debug(error, ex);
            return ExitCodes.Failure;
        }
    }

    private static string OneLine(string message) => message.ReplaceLineEndings(" ");

    private static void Debug(TextWriter error, Exception ex)
    {
        if (Environment.GetEnvironmentVariable(DebugVariable) == "1") error.WriteLine(ex.ToString());
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
