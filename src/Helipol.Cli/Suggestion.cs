namespace Helipol.Cli;

/// <summary>
/// The "did you mean" word for a mistyped verb or option: the closest known word by optimal string
/// alignment distance (Levenshtein with adjacent transpositions, so 'biuld' is one edit from
/// 'build'), or the only known word the typed one begins.
/// </summary>
public static class Suggestion
{
    /// <summary>The closest of <paramref name="known"/> to <paramref name="typed"/> (both compared without leading dashes, ignoring case), or null when none is close.</summary>
    public static string? Closest(string typed, IEnumerable<string> known)
    {
        var word = Bare(typed);
        if (word.Length == 0) return null;
        string? best = null;
        int bestDistance = int.MaxValue;
        var prefixed = new List<string>();
        foreach (var candidate in known)
        {
            var bare = Bare(candidate);
            if (bare.StartsWith(word, StringComparison.Ordinal)) prefixed.Add(candidate);
            // Fuzzy matches only against words of three letters or more: 'x' is not a typo of '-o'.
            if (bare.Length < 3) continue;
            int d = Distance(word, bare);
            // Up to half the known word's letters may differ: '--pts' reaches '--points' (3 of 6).
            if (d <= Math.Max(1, bare.Length / 2) && d < bestDistance) { best = candidate; bestDistance = d; }
        }
        if (best is not null) return best;
        return prefixed.Count == 1 ? prefixed[0] : null;
    }

    private static string Bare(string s) => s.TrimStart('-').ToLowerInvariant();

    /// <summary>Optimal string alignment distance (insertions, deletions, substitutions, adjacent transpositions).</summary>
    internal static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (int j = 0; j <= b.Length; j++) d[0, j] = j;
        for (int i = 1; i <= a.Length; i++)
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                int v = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1]) v = Math.Min(v, d[i - 2, j - 2] + 1);
                d[i, j] = v;
            }
        return d[a.Length, b.Length];
    }
}
