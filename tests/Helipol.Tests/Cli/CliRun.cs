using Helipol.Cli;

namespace Helipol.Tests.Cli;

/// <summary>Runs the real command entry in-process and captures what it prints.</summary>
internal sealed record CliRun(int ExitCode, string Out, string Error)
{
    public static CliRun Of(params string[] args)
    {
        var output = new StringWriter { NewLine = "\n" };
        var error = new StringWriter { NewLine = "\n" };
        var code = CliApp.Run(args, output, error);
        return new CliRun(code, output.ToString(), error.ToString());
    }

    public string FirstErrorLine => Error.Split('\n')[0];
}
