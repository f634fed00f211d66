using Helipol.Design;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Pipeline;

/// <summary>
/// A design the solver cannot work on (bad input), raised with its one printable line
/// (file:line:column or file, the key, what was found, what is allowed).
/// </summary>
public sealed class DesignRefusedException(string line) : Exception(line);

/// <summary>The pre-solve guard as a verb shows it: one error line at the key to change, or null.</summary>
public static class DesignRefusal
{
    public static string? LineFor(PolarizerDesign design, SpecDocument? doc = null) => ErrorFor(design, doc)?.ToString();

    /// <summary>The guard's refusal at the key's place in <paramref name="doc"/> (read again from the design's file when not given).</summary>
    public static SpecError? ErrorFor(PolarizerDesign design, SpecDocument? doc = null)
    {
        if (ModelGuard.Refusal(design, CoatingCalibration.For(design).Factor) is not { } refusal) return null;
        doc ??= SpecReader.ReadFile(design.SourceFile, design.SourceFile);
        var mark = doc.Find(refusal.KeyPath)?.Mark ?? SourceMark.FileStart;
        return new SpecError(design.SourceFile, mark, refusal.KeyPath, refusal.Found, refusal.Allowed);
    }

    /// <summary>The line for a search that found nothing it could build.</summary>
    public static string SearchLine(PolarizerDesign design, SearchException ex) =>
        $"{design.SourceFile}: polarizer: found {ex.Message}, allowed a search range with buildable geometry (widen {Keys.SolveSearch} or the former)";

    /// <summary>Error line for a verb that needs a pinned geometry (file:line:column: key: found auto, allowed ...).</summary>
    public static string PinnedError(PolarizerDesign design, string keyPath)
    {
        var doc = SpecReader.ReadFile(design.SourceFile, design.SourceFile);
        var mark = doc.Find(keyPath)?.Mark;
        return new SpecError(design.SourceFile, mark ?? SourceMark.FileStart, keyPath, "auto",
            "a pinned value (this verb evaluates the geometry as written; run 'helipol solve' to choose it)").ToString();
    }
}
