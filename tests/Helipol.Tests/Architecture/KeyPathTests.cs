using System.Text.RegularExpressions;
using Helipol.Model;
using Helipol.Spec;
using Xunit;

namespace Helipol.Tests.Architecture;

/// <summary>
/// Key paths are written in one place: the table (Spec/DesignKeys) and its handles (Model/Keys).
/// Everywhere else a key is named through a handle, so renaming a key is one edit and a message
/// can never name a key the reader no longer accepts.
/// </summary>
public sealed class KeyPathTests
{
    private static readonly string[] TableFiles = ["Helipol.Core/Spec/DesignKeys.cs", "Helipol.Core/Model/Keys.cs"];

    /// <summary>Dotted paths only: a lone block name ("band", "solve") is also an ordinary word.</summary>
    private static readonly Regex AnyKeyPath = new(
        @"(?<![A-Za-z0-9_.])(" + string.Join("|", DesignKeys.AllKeyPaths().Where(p => p.Contains('.')).OrderByDescending(p => p.Length).Select(Regex.Escape)) + @")(?![A-Za-z0-9_])");

    /// <summary>Whole-line and trailing comments go: a comment may quote a key, as a test or README does.</summary>
    private static string WithoutComments(string line)
    {
        var trimmed = line.TrimStart();
        if (trimmed.StartsWith("//", StringComparison.Ordinal)) return "";
        int quotes = 0;
        for (int i = 0; i + 1 < line.Length; i++)
        {
            if (line[i] == '"' && (i == 0 || line[i - 1] != '\\')) quotes++;
            else if (line[i] == '/' && line[i + 1] == '/' && quotes % 2 == 0 && i > 0 && char.IsWhiteSpace(line[i - 1])) return line[..i];
        }
        return line;
    }

    [Fact]
    public void No_key_path_is_typed_outside_the_key_table()
    {
        var src = Path.Combine(TestPaths.RepositoryRoot, "src");
        var found = new List<string>();
        foreach (var file in Directory.GetFiles(src, "*.cs", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
        {
            var relative = Path.GetRelativePath(src, file).Replace('\\', '/');
            if (relative.Contains("/obj/") || relative.Contains("/bin/") || TableFiles.Contains(relative)) continue;
            var lines = File.ReadAllLines(file);
            for (int i = 0; i < lines.Length; i++)
                foreach (Match m in AnyKeyPath.Matches(WithoutComments(lines[i])))
                    found.Add($"{relative}:{i + 1}: {m.Value}");
        }
        Assert.Empty(found);
    }

    /// <summary>The check above would pass on an empty pattern; it must see a key where one is typed.</summary>
    [Fact]
    public void The_check_sees_a_typed_key_and_ignores_comments()
    {
        Assert.Matches(AnyKeyPath, WithoutComments("var x = doc.Si(\"polarizer.former.bore\");"));
        Assert.Matches(AnyKeyPath, WithoutComments("return $\"at most polarizer.former.height ({h})\";"));
        Assert.DoesNotMatch(AnyKeyPath, WithoutComments("    // polarizer.former.bore is the hole"));
        Assert.DoesNotMatch(AnyKeyPath, WithoutComments("var x = 1; // see polarizer.former.bore"));
        Assert.DoesNotMatch(AnyKeyPath, WithoutComments("var x = Keys.PolarizerFormerBore;"));
    }

    [Fact]
    public void Every_table_key_has_exactly_one_handle()
    {
        var handles = typeof(Keys).GetFields().Where(f => typeof(DesignKey).IsAssignableFrom(f.FieldType)).Select(f => ((DesignKey)f.GetValue(null)!).Path).ToList();
        Assert.Equal(DesignKeys.AllKeyPaths().ToList(), handles);
        Assert.Equal("bore", Keys.PolarizerFormerBore.Field.Name);
    }
}
