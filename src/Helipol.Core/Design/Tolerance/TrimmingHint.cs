using System.Globalization;

namespace Helipol.Design;

/// <summary>A length change for every element, the sentence that tells a builder about it, and a one-line summary for the packet.</summary>
/// <param name="LengthChangeMm">Signed change that moves the best-AR frequency to the band centre, mm (negative: trim); NaN when there is none.</param>
public sealed record TrimmingAdvice(double LengthChangeMm, string Text, string Summary);

/// <summary>
/// The trimming hint, tied to the design: the model's best-AR frequency f_best, its slope s against
/// element length (MHz per mm, from central differences) and the band centre f_c give, to first
/// order (a Taylor step on a locally linear response), the length change ΔL = (f_c − f_best) / s that
/// moves the best AR to the centre. Longer elements resonate lower (s &lt; 0), so a best AR below the
/// centre asks for a trim and one above it for longer elements. A change under half the search's
/// final step (the finest trim a builder makes, and the resolution the length was solved to) is not
/// worth a cut; one beyond the design's length tolerance is flagged,
/// since it is larger than the scatter of the builds themselves. Figures are printed with enough
/// digits that slope × change gives the stated offset.
/// </summary>
public static class TrimmingHint
{
    public static TrimmingAdvice For(double centreHz, double bestArHz, double mhzPerMmLength, double finestTrimMm, double lengthToleranceMm)
    {
        if (!double.IsFinite(bestArHz) || !double.IsFinite(mhzPerMmLength) || mhzPerMmLength == 0)
            return new(double.NaN, "no trimming hint: the axial ratio has no minimum within ±8 % of the band centre, so trimming cannot be tied to a best-AR frequency",
                "no hint: no AR minimum within ±8 % of the centre");
        var inv = CultureInfo.InvariantCulture;
        double offsetMHz = (bestArHz - centreHz) / 1e6;
        double change = -offsetMHz / mhzPerMmLength;
        string where = string.Create(inv, $"the model's best AR is at {bestArHz / 1e6:0.#} MHz, {Math.Abs(offsetMHz):0.#} MHz {(offsetMHz >= 0 ? "above" : "below")} the {centreHz / 1e6:0.#} MHz centre");
        string slope = $"{SignedNumber.Format(mhzPerMmLength, "0.0")} MHz per mm of length";
        if (Math.Abs(change) < finestTrimMm / 2)
            return new(change, string.Create(inv, $"no trimming needed: {where}; at {slope} that is a {Math.Abs(change):0.00} mm change, under half the {finestTrimMm:0.0#} mm step the length was solved to"),
                string.Create(inv, $"none needed (best AR {bestArHz / 1e6:0.#} MHz, {Math.Abs(change):0.00} mm from the centre)"));
        string text = change < 0
            ? string.Create(inv, $"trim {-change:0.00} mm off every element: {where}, and at {slope} {-change:0.00} mm shorter moves it up to the centre")
            : string.Create(inv, $"cut the elements {change:0.00} mm longer (a cut wire cannot be lengthened): {where}, and at {slope} {change:0.00} mm longer moves it down to the centre");
        string summary = string.Create(inv, $"{(change < 0 ? "trim" : "lengthen")} every element {Math.Abs(change):0.00} mm (best AR {bestArHz / 1e6:0.#} MHz)");
        if (Math.Abs(change) > lengthToleranceMm)
        {
            text += string.Create(inv, $"; that is more than the ±{lengthToleranceMm:0.##} mm length tolerance, so confirm it on a measured build before cutting");
            summary += "; beyond the length tolerance";
        }
        return new(change, text, summary);
    }

    /// <summary>The hint cut down to <paramref name="changeMm"/>, because the full step put part of the coverage window into the wrong sense.</summary>
    public static TrimmingAdvice Limited(TrimmingAdvice full, double changeMm, string? flippedAt)
    {
        var inv = CultureInfo.InvariantCulture;
        string why = flippedAt is null ? "the full step cannot be modelled" : $"the full step flips the sense at {flippedAt}, inside the coverage window";
        string verb = changeMm < 0 ? string.Create(inv, $"trim {-changeMm:0.00} mm off every element") : string.Create(inv, $"cut the elements {changeMm:0.00} mm longer");
        return new(changeMm, string.Create(inv, $"{verb}, not the full {Math.Abs(full.LengthChangeMm):0.00} mm: {why}"),
            string.Create(inv, $"{(changeMm < 0 ? "trim" : "lengthen")} every element {Math.Abs(changeMm):0.00} mm (a larger change flips the sense)"));
    }

    /// <summary>No hint: every tried step toward the centre put part of the window into the wrong sense.</summary>
    public static TrimmingAdvice Refused(TrimmingAdvice full, string? flippedAt)
    {
        var inv = CultureInfo.InvariantCulture;
        string why = flippedAt is null ? "cannot be modelled" : $"flips the sense at {flippedAt}, inside the coverage window";
        return new(0, string.Create(inv, $"no trimming: moving the best axial ratio toward the centre ({(full.LengthChangeMm < 0 ? "trimming" : "lengthening")} up to {Math.Abs(full.LengthChangeMm):0.00} mm) {why}; keep the solved length"),
            "none: a change toward the centre would spoil the coverage window");
    }
}
