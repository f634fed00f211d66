using System.Text.RegularExpressions;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace Helipol.Spec;

/// <summary>
/// Builds a <see cref="YamlNode"/> tree from YamlDotNet's parser events, keeping every node's
/// line and column. Working at the event level (rather than deserializing into objects) is what
/// lets every later message point at the exact place in the file, and lets us refuse anchors and
/// aliases outright: a design never needs them, and refusing them rules out alias-expansion
/// ("billion laughs") inputs.
/// </summary>
public static partial class YamlTreeBuilder
{
    /// <summary>The deepest design key is four mappings down; anything much deeper is not a design.</summary>
    public const int MaxDepth = 12;

    /// <summary>Parses one YAML document. Returns null for a file with no content (only comments or blanks).</summary>
    public static YamlNode? Build(string text, string shownAs, SpecErrors duplicates)
    {
        var parser = new Parser(new StringReader(text));
        try
        {
            parser.Consume<StreamStart>();
            if (parser.TryConsume<StreamEnd>(out _)) return null;
            parser.Consume<DocumentStart>();
            var root = ReadNode(parser, shownAs, "", 0, duplicates);
            parser.Consume<DocumentEnd>();
            if (parser.Current is DocumentStart second)
                throw Error(shownAs, second.Start, SpecError.WholeFile, "a second YAML document", "one document per design file");
            parser.Consume<StreamEnd>();
            return root;
        }
        catch (YamlException ex)
        {
            throw Error(shownAs, ex.Start, "(syntax)", Describe(ex), "well-formed YAML");
        }
        catch (Exception ex) when (ex is InvalidOperationException or ArgumentException or IndexOutOfRangeException)
        {
            // The scanner can fail outside its own exception type on some malformed input; the last
            // event it produced is the best place we know.
            var near = parser.Current is { } last ? last.End : new Mark();
            throw Error(shownAs, near, "(syntax)", "YAML the parser cannot read after this point", "well-formed YAML");
        }
    }

    private static YamlNode ReadNode(IParser parser, string file, string path, int depth, SpecErrors duplicates)
    {
        var current = parser.Current ?? throw new YamlException("unexpected end of input");
        var shown = path.Length == 0 ? "(document)" : path;
        if (current is AnchorAlias alias)
            throw Error(file, alias.Start, shown, $"an alias *{alias.Value}", "plain values (anchors and aliases are not used in design files)");
        if (current is NodeEvent node)
        {
            if (!node.Anchor.IsEmpty)
                throw Error(file, node.Start, shown, $"an anchor &{node.Anchor}", "plain values (anchors and aliases are not used in design files)");
            if (!node.Tag.IsEmpty && !(node is Scalar { Tag.IsNonSpecific: true }))
                throw Error(file, node.Start, shown, $"the tag {node.Tag}", "untagged values");
        }
        if (depth > MaxDepth)
            throw Error(file, current.Start, shown, $"nesting deeper than {MaxDepth} levels", "the design keys' nesting");

        switch (current)
        {
            case Scalar scalar:
                parser.MoveNext();
                return new YamlScalar(ToMark(scalar.Start), scalar.Value, scalar.Style == ScalarStyle.Plain);
            case SequenceStart sequenceStart:
            {
                parser.MoveNext();
                var items = new List<YamlNode>();
                while (!parser.TryConsume<SequenceEnd>(out _))
                    items.Add(ReadNode(parser, file, $"{path}[{items.Count}]", depth + 1, duplicates));
                return new YamlSequence(ToMark(sequenceStart.Start), items);
            }
            case MappingStart mappingStart:
            {
                parser.MoveNext();
                var entries = new List<KeyValuePair<YamlScalar, YamlNode>>();
                var seen = new Dictionary<string, SourceMark>(StringComparer.Ordinal);
                while (!parser.TryConsume<MappingEnd>(out _))
                {
                    var keyNode = ReadNode(parser, file, path, depth + 1, duplicates);
                    if (keyNode is not YamlScalar key)
                        throw new DesignInputException(new SpecError(file, keyNode.Mark, shown, $"{keyNode.Describe()} used as a key", "plain text keys"));
                    var keyText = YamlScalar.KeyText(key.Value);
                    var keyPath = path.Length == 0 ? keyText : $"{path}.{keyText}";
                    var value = ReadNode(parser, file, keyPath, depth + 1, duplicates);
                    if (seen.TryGetValue(key.Value, out var first))
                    {
                        duplicates.Add(key.Mark, keyPath, $"a second '{keyText}' key (first at line {first.Line})", "each key once");
                        continue;
                    }
                    seen.Add(key.Value, key.Mark);
                    entries.Add(new(key, value));
                }
                return new YamlMapping(ToMark(mappingStart.Start), entries);
            }
            default:
                throw new YamlException(current.Start, current.End, $"unexpected {current.GetType().Name}");
        }
    }

    internal static SourceMark ToMark(Mark mark) => new((int)Math.Max(1, mark.Line), (int)Math.Max(1, mark.Column));

    private static DesignInputException Error(string file, Mark mark, string path, string found, string allowed) =>
        new(new SpecError(file, ToMark(mark), path, found, allowed));

    /// <summary>YamlDotNet prefixes its messages with the marks; we print those ourselves.</summary>
    private static string Describe(YamlException ex)
    {
        var message = MarkPrefix().Replace(ex.Message, "").Trim().TrimEnd('.');
        if (message.Length == 0) message = "malformed YAML";
        return "a YAML syntax error (" + char.ToLowerInvariant(message[0]) + message[1..] + ")";
    }

    [GeneratedRegex(@"^\(Line: \d+, Col: \d+, Idx: \d+\) - \(Line: \d+, Col: \d+, Idx: \d+\):\s*")]
    private static partial Regex MarkPrefix();
}
