namespace Helipol.Spec;

/// <summary>Suggests the closest known word for a typo, by Levenshtein edit distance (Levenshtein, 1966).</summary>
public static class DidYouMean
{
    public static string? Closest(string typed, IEnumerable<string> known)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var word in known)
        {
            var distance = Distance(typed.ToLowerInvariant(), word.ToLowerInvariant());
            if (distance < bestDistance) { best = word; bestDistance = distance; }
        }
        // Accept up to a third of the word's letters wrong (at least 2): close enough to be a typo.
        return best is not null && bestDistance <= Math.Max(2, best.Length / 3) ? best : null;
    }

    public static int Distance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++) previous[j] = j;
        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var substitution = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                current[j] = Math.Min(Math.Min(previous[j] + 1, current[j - 1] + 1), substitution);
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }
}
