using System.Globalization;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary>
/// Sizes of a starter design for one centre frequency. The 5.8 GHz rule of thumb is scaled by
/// wavelength (<see cref="PracticeScaling"/>); sizes that would leave the design file's limits or
/// the thin-wire model's comfort zone are clamped, so a starter passes <c>check</c> from
/// <see cref="DesignKeys.LowestFrequencyHz"/> to <see cref="DesignKeys.HighestFrequencyHz"/>.
/// Every length is in metres.
/// </summary>
public sealed record StarterSizes(
    double WhipLengthM, double WhipDiameterM, double CoverDiameterM, double BoreM,
    double OuterDiameterM, double FormerHeightM, double WireDiameterM, double CentreHeightM,
    int Rings, double BoardWidthM, double BoardHeightM, double BoardThicknessM, double PrintClearanceM)
{
    private const double Mm = 1e-3;

    /// <summary>Kerf the starter writes; the board is sized with it.</summary>
    public const double KerfM = 0.2 * Mm;

    public static StarterSizes For(double centerHz, bool monopole)
    {
        var s = PracticeScaling.Scale(centerHz);
        var wavelength = Helipol.Engine.PhysicalConstants.SpeedOfLight / centerHz;
        // A half-wave dipole is a little shorter than λ/2 (about 0.48 λ); a monopole starter is the
        // 5/8-λ ground-plane whip, long enough that the practice rise (0.42 λ) stays on it, where a
        // quarter-wave whip is shorter than the elements (common practice, no source).
        var whipLength = monopole ? 0.625 * wavelength : 0.48 * wavelength;

        // Keep every radius under 0.95 % of λ, inside the thin-wire warning's 1 % (DesignWarnings).
        var thinWire = 2 * 0.0095 * wavelength;
        // 1 mm whip inside a 6 mm cover at 5.8 GHz (common practice, no source), scaled; a whip
        // thicker than 6 mm or a cover more than 20 mm over the whip is rare at any band (from memory).
        var whip = Math.Min(Math.Clamp(1 * Mm * s, 0.1 * Mm, 6 * Mm), thinWire);
        var cover = Math.Max(1.5 * whip, Math.Min(6 * Mm * s, whip + 20 * Mm));
        var bore = cover * 16.0 / 15.0; // 6.4 mm over a 6 mm cover: a sliding fit

        var height = PracticeScaling.FormerHeightM(centerHz);
        var rise = PracticeScaling.ElementRiseM(centerHz);
        var length = PracticeScaling.ElementLengthM(centerHz);
        var outer = Math.Min(PracticeScaling.FormerOuterDiameterM(centerHz), 1000 * Mm);

        // 0.5 mm wire at 5.8 GHz (common practice, no source), scaled, between 0.35 mm (the thinnest
        // whose printed groove, 0.6 × diameter, is one 0.2 mm layer deep) and 2 mm (bent by hand);
        // then thin enough for the thin-wire model: radius under 0.95 % λ, 34 radii per element
        // (the warning asks 32), and a wire diameter of former left beyond each element end.
        var wire = Math.Clamp(0.5 * Mm * s, 0.35 * Mm, 2 * Mm);
        wire = Math.Min(wire, Math.Min(thinWire, Math.Min(2 * length / 34, 0.9 * (height - rise) / 2)));
        wire = Math.Floor(wire / (0.01 * Mm)) * 0.01 * Mm;

        var centre = monopole ? whipLength / 2 : 0;

        // Six rings by default; thicker than a 38 mm board or thinner than 1 mm is not cut by hand.
        var rings = Math.Clamp(height / 6 > 38 * Mm ? (int)Math.Ceiling(height / (38 * Mm)) : height / 6 < 1 * Mm ? (int)Math.Floor(height / Mm) : 6, 1, 50);
        var thickness = Math.Clamp(height / rings, 1 * Mm, 200 * Mm);
        // One ring as the ring templates nest it (DesignChecks.BoardNeededMm), rounded up to 10 mm;
        // never smaller than the default 300 × 200 mm board.
        static double Up10(double mm) => Math.Ceiling(mm / 10 - 1e-9) * 10 * Mm;
        var (needWidthMm, needHeightMm) = DesignChecks.BoardNeededMm(outer / Mm, KerfM / Mm);
        var boardWidth = Up10(needWidthMm);
        var boardHeight = Up10(needHeightMm);
        return new StarterSizes(whipLength, whip, cover, bore, outer, height, wire, centre, rings,
            Math.Max(300 * Mm, boardWidth), Math.Max(200 * Mm, boardHeight), thickness,
            // The 0.2 mm default, but never more than half the wire, or the groove no longer places it.
            Math.Min(0.2 * Mm, Math.Floor(wire / 2 / (0.01 * Mm)) * 0.01 * Mm));
    }
}

/// <summary>The starter design's text: every key a first build needs, with a comment on each.</summary>
public static class StarterDesign
{
    private static string Mm(double metres)
    {
        var mm = metres * 1e3;
        var format = mm < 10 ? "0.##" : "0.#";
        return mm.ToString(format, CultureInfo.InvariantCulture) + " mm";
    }

    public static string Text(string name, double centerHz, bool monopole)
    {
        var z = StarterSizes.For(centerHz, monopole);
        var ghz = (centerHz / 1e9).ToString("0.####", CultureInfo.InvariantCulture);
        var lines = new List<(string Text, string? Comment)>
        {
            ("name: " + name, "names the output folder: letters, digits, - and _"),
            ($"band: {{ center: {ghz} GHz }}", "add low: and high: for the edges (default ±1.5 %)"),
            ("whip:", null),
            ($"  kind: {(monopole ? "monopole" : "dipole")}", "dipole (free space) | monopole (on a ground plane)"),
            ($"  length: {Mm(z.WhipLengthM)}", monopole ? "ground to tip; measure your whip" : "tip to tip; measure your whip"),
            ($"  diameter: {Mm(z.WhipDiameterM)}", "conductor diameter"),
            ($"  cover_diameter: {Mm(z.CoverDiameterM)}", "outside of the plastic cover; delete for a bare whip"),
            ("polarizer:", null),
            ("  sense: rhcp", "rhcp | lhcp: match the antenna at the other end"),
            ("  winding: auto", "auto | left | right"),
            ("  elements: 5", "3..8 or auto"),
            ("  element_length: auto", $"or a length to pin it, e.g. {Mm(PracticeScaling.ElementLengthM(centerHz))}"),
            ("  element_rise: auto", $"or a length to pin it, e.g. {Mm(PracticeScaling.ElementRiseM(centerHz))}"),
            ($"  centre_height: {Mm(z.CentreHeightM)}", monopole ? "element centres above the ground plane" : "element centres above the dipole feed"),
            ("  wire:", null),
            ($"    diameter: {Mm(z.WireDiameterM)}", "element wire"),
            ("    material: copper", "pec | copper | brass | steel | stainless"),
            ("  former:", null),
            ("    material: eps-foam", "eps-foam | xps-foam | pla | petg | air"),
            ($"    outer_diameter: {Mm(z.OuterDiameterM)}", "the element wire lies on it; or auto"),
            ($"    bore: {Mm(z.BoreM)}", "slides over the whip's cover"),
            ($"    height: {Mm(z.FormerHeightM)}", "along the whip"),
            ("  wrap: { material: pvc-tape, layers: 1 }", "or: wrap: none"),
            ("fabrication:", null),
            ($"  kerf: {Mm(StarterSizes.KerfM)}", "cut width of your laser, wire or blade"),
            ($"  rings: {z.Rings}", "foam rings stacked to make the former"),
            ("  board:", "foam board the rings are cut from"),
            ($"    width: {Mm(z.BoardWidthM)}", null),
            ($"    height: {Mm(z.BoardHeightM)}", null),
            ($"    thickness: {Mm(z.BoardThicknessM)}", "best equal to one ring's thickness"),
            ($"  print_clearance: {Mm(z.PrintClearanceM)}", "extra room in printed bores and grooves"),
            ("  paper: a4", "a4 | letter"),
        };
        var column = lines.Max(l => l.Text.Length) + 2;
        var text = new System.Text.StringBuilder();
        text.Append("# yaml-language-server: $schema=./").Append(DesignSchema.FileName).Append('\n');
        text.Append("# Starter design written by `helipol new`. Sizes come from practice scaling (the 5.8 GHz\n");
        text.Append("# rule of thumb scaled by wavelength); `helipol solve` refines element length and rise.\n");
        foreach (var (line, comment) in lines)
            text.Append(comment is null ? line : line.PadRight(column) + "# " + comment).Append('\n');
        return text.ToString();
    }
}
