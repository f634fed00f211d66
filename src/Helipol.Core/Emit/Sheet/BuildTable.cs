using System.Globalization;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>The numbers a builder works from, as label/value rows, formatted the same everywhere.</summary>
public static class BuildTable
{
    public static IReadOnlyList<(string Label, string Value)> Rows(PolarizerGeometry g)
    {
        var i = g.Input;
        string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
        var deg = 180 / Math.PI;
        return
        [
            ("Design", i.DesignName),
            ("Frequency", FrequencyLabel(i.FrequencyHz)),
            ("Sense", F($"{ChoiceWords.Label(i.Sense)}, {(i.Winding == Winding.Right ? "right-hand" : "left-hand")} winding")),
            ("Count", F($"{i.ElementCount} elements")),
            ("Spacing", F($"{360.0 / i.ElementCount:0.##}° = {g.ElementSpacingMm:0.00} mm between starts at the wire axis")),
            ("Element length", F($"{i.ElementLengthMm:0.00} mm, {(i.ToleranceIsCutFigure ? "cut to within" : "tolerance")} ± {i.LengthToleranceMm:0.00} mm")),
            ("Rise", F($"{i.ElementRiseMm:0.00} mm ± {i.RiseToleranceMm:0.00} mm, centred {i.CentreHeightMm:0.00} mm above the bottom")),
            ("Pitch angle", F($"{g.PitchAngleRad * deg:0.00}° from horizontal at the wire axis")),
            ("Arc angle", F($"{g.ArcAngleRad * deg:0.00}° round the former per element")),
            ("Bend radius", F($"{g.BendRadiusMm:0.00} mm")),
            ("Wire", F($"{i.WireDiameterMm:0.00} mm, axis on a {2 * g.ElementAxisRadiusMm:0.00} mm circle")),
            ("Former", F($"{i.FormerOuterDiameterMm:0.00} mm outside, {i.FormerBoreDiameterMm:0.00} mm bore, {i.FormerHeightMm:0.00} mm high")),
            ("Wrap", i.WrapLayers > 0 ? F($"{i.WrapLayers} × {i.WrapMaterial}, {i.WrapThicknessMm:0.00} mm thick") : "none"),
        ];
    }


    public static string FrequencyLabel(double hz) => hz switch
    {
        <= 0 => "not given",
        >= 1e9 => (hz / 1e9).ToString("0.000", CultureInfo.InvariantCulture) + " GHz",
        _ => (hz / 1e6).ToString("0.000", CultureInfo.InvariantCulture) + " MHz",
    };
}
