using System.Text.Json;
using System.Text.Json.Nodes;
using Helipol.Spec;
using Json.Schema;
using YamlDotNet.RepresentationModel;

namespace Helipol.Tests.Cli;

/// <summary>
/// The design file's JSON Schema, checked with an outside validator (JsonSchema.Net, draft 2020-12):
/// the committed copy matches the generator, every demo design validates, broken designs do not.
/// </summary>
public class SchemaTests
{
    private static JsonSchema Schema => JsonSchema.FromText(DesignSchema.Generate());

    [Fact]
    public void CommittedSchemaMatchesTheSchemaVerb()
    {
        // Regenerate with: make schema
        var run = CliRun.Of("schema");
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(File.ReadAllText(Path.Combine(TestPaths.Designs, DesignSchema.FileName)), run.Out);
    }

    [Fact]
    public void SchemaIsValidDraft2020_12()
    {
        var metaSchema = MetaSchemas.Draft202012;
        using var doc = JsonDocument.Parse(DesignSchema.Generate());
        Assert.True(metaSchema.Evaluate(doc.RootElement).IsValid);
    }

    public static TheoryData<string> Designs() => TestPaths.DemoDesignNames();

    [Theory]
    [MemberData(nameof(Designs))]
    public void DemoDesignValidatesAgainstTheSchema(string name)
    {
        var path = Path.Combine(TestPaths.Designs, name);
        Assert.StartsWith("# yaml-language-server: $schema=./helipol.schema.json", File.ReadAllText(path));
        var result = Schema.Evaluate(YamlToJson(File.ReadAllText(path)), new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, string.Join("; ", result.Details?.Where(d => d.Errors is not null).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}")) ?? Array.Empty<string>()));
    }

    [Theory]
    [InlineData("bare-number-length.yaml")]
    [InlineData("unknown-top-key.yaml")]
    [InlineData("bad-choice.yaml")]
    [InlineData("elements-too-many.yaml")]
    [InlineData("missing-name.yaml")]
    public void BrokenDesignFailsTheSchema(string name)
    {
        var text = File.ReadAllText(Path.Combine(TestPaths.Data, "bad", name));
        Assert.False(Schema.Evaluate(YamlToJson(text)).IsValid);
    }

    /// <summary>YAML to JSON as an editor's language server sees it (YAML 1.2 core schema: plain ints are numbers).</summary>
    private static JsonElement YamlToJson(string yaml)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(yaml));
        var node = Convert(stream.Documents[0].RootNode);
        return JsonDocument.Parse(node!.ToJsonString()).RootElement.Clone();
    }

    private static JsonNode? Convert(YamlDotNet.RepresentationModel.YamlNode node) => node switch
    {
        YamlMappingNode m => new JsonObject(m.Children.Select(c => KeyValuePair.Create(((YamlScalarNode)c.Key).Value!, Convert(c.Value)))),
        YamlSequenceNode s => new JsonArray(s.Children.Select(Convert).ToArray()),
        YamlScalarNode { Style: YamlDotNet.Core.ScalarStyle.Plain } p when long.TryParse(p.Value, out var i) => JsonValue.Create(i),
        YamlScalarNode p => JsonValue.Create(p.Value),
        _ => null,
    };
}
