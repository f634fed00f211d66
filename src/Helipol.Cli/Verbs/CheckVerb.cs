using System.CommandLine;

namespace Helipol.Cli.Verbs;

/// <summary><c>helipol check FILE...</c>: reads and checks designs, writes nothing.</summary>
public static class CheckVerb
{
    public static Command Create(CliConsole console)
    {
        var files = new Argument<string[]>("FILE") { Description = "design files (.yaml)", Arity = ArgumentArity.OneOrMore };
        var command = new Command("check", "Check design files and report every problem; writes nothing.") { files };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(parse.GetValue(files)!, console);
            if (designs is null) return ExitCodes.BadInput;
            foreach (var design in designs)
                console.Out.WriteLine($"{design.SourceFile}: ok ({design.Name})");
            return ExitCodes.Ok;
        });
        return command;
    }
}
