using System.CommandLine;
using Helipol.Emit;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary><c>helipol schema [-o FILE]</c>: the JSON Schema of the design file, for editors.</summary>
public static class SchemaVerb
{
    public static Command Create(CliConsole console)
    {
        var outputFile = new Option<string?>("--output", "-o") { Description = $"file to write instead of stdout (e.g. designs/{DesignSchema.FileName})" };
        var command = new Command("schema", "Print the JSON Schema (draft 2020-12) of the design file.") { outputFile };
        command.SetAction(parse =>
        {
            var schema = DesignSchema.Generate();
            if (parse.GetValue(outputFile) is { } path)
            {
                AtomicFile.WriteAllText(path, schema);
                console.Out.WriteLine($"wrote {path}");
            }
            else console.Out.Write(schema);
            return ExitCodes.Ok;
        });
        return command;
    }
}
