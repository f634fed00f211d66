using System.Text;
using System.Text.RegularExpressions;

namespace Helipol.Cli;

/// <summary>
/// Last line of defence before files are written: a NaN or infinity in design.json or report.md
/// means a number escaped the solver's guards. Such a build is a runtime failure, not a file.
/// </summary>
public static partial class NonFiniteGuard
{
    [GeneratedRegex(@"\b(NaN|Infinity)\b|∞")]
    private static partial Regex NonFinite();

    /// <summary>The first offending text file and the token found, or null when every number is finite.</summary>
    public static (string File, string Token)? Find(IEnumerable<(string Name, byte[] Bytes)> files)
    {
        foreach (var (name, bytes) in files)
        {
            if (!name.EndsWith(".json", StringComparison.Ordinal) && !name.EndsWith(".md", StringComparison.Ordinal)) continue;
            var match = NonFinite().Match(Encoding.UTF8.GetString(bytes));
            if (match.Success) return (name, match.Value);
        }
        return null;
    }
}
