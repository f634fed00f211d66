using Helipol.Design;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli;

/// <summary>
/// A design the solver cannot work on (bad input, exit 2), raised with its one printable line;
/// <see cref="CliApp"/> prints the line and returns <see cref="ExitCodes.BadInput"/>.
/// </summary>
public sealed class DesignRefusedException(string line) : Exception(line);

/// <summary>The pre-solve guard as a verb shows it: one error line at the key to change, or null.</summary>
public static class DesignRefusal
{
    public static string? LineFor(PolarizerDesign design, SpecDocument? doc = null)
    {
        if (ModelGuard.Refusal(design, CoatingCalibration.For(design).Factor) is not { } refusal) return null;
        doc ??= SpecReader.ReadFile(design.SourceFile, design.SourceFile);
        var mark = doc.Find(refusal.KeyPath)?.Mark ?? SourceMark.FileStart;
        return new SpecError(design.SourceFile, mark, refusal.KeyPath, refusal.Found, refusal.Allowed).ToString();
    }

    /// <summary>The line for a search that found nothing it could build.</summary>
    public static string SearchLine(PolarizerDesign design, SearchException ex) =>
        $"{design.SourceFile}: polarizer: found {ex.Message}, allowed a search range with buildable geometry (widen solve.search or the former)";
}
