using Spectre.Console;

namespace Helipol.Cli;

/// <summary>Where a verb writes: plain writers for lines, and a Spectre.Console view of stdout for tables.</summary>
public sealed class CliConsole
{
    public CliConsole(TextWriter output, TextWriter error)
    {
        Out = output;
        Error = error;
        Tables = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(output),
            Ansi = AnsiSupport.Detect,
            ColorSystem = ColorSystemSupport.Detect,
            Interactive = InteractionSupport.No,
        });
    }

    public TextWriter Out { get; }
    public TextWriter Error { get; }
    public IAnsiConsole Tables { get; }
}
