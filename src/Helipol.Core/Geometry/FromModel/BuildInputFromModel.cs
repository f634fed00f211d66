using Helipol.Model;

namespace Helipol.Geometry.FromModel;

/// <summary>
/// Hands a resolved design and its solved element layout to the geometry as the neutral
/// <see cref="PolarizerBuildInput"/> in millimetres. This is the only place where Geometry looks at
/// the Model; everything downstream sees millimetres and plain enums.
/// </summary>
public static class BuildInputFromModel
{
    private const double MmPerM = 1000.0;

    /// <param name="design">The checked design.</param>
    /// <param name="layout">Element count, length, rise and former diameter to build (solved or pinned).</param>
    /// <param name="winding">The winding chosen for the requested sense (never <see cref="Winding.Auto"/>).</param>
    /// <param name="summary">Lines for the build packet's summary page.</param>
    /// <param name="plotPngs">Plots for the packet, as PNG bytes.</param>
    /// <param name="cutToleranceMm">Length and rise tolerance from the tolerance analysis ("cut to within ± x mm"); the design's spreads when not given.</param>
    public static PolarizerBuildInput Create(PolarizerDesign design, ElementLayout layout, Winding winding,
        IReadOnlyList<SummaryLine>? summary = null, IReadOnlyList<byte[]>? plotPngs = null, (double LengthMm, double RiseMm)? cutToleranceMm = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(layout);
        if (winding == Winding.Auto)
            throw new ArgumentException("winding must be resolved to left or right before fabrication", nameof(winding));
        var p = design.Polarizer;
        var f = design.Fabrication;
        var t = design.Tolerance;
        var heightMm = p.Former.HeightM * MmPerM;
        return new PolarizerBuildInput
        {
            DesignName = design.Name,
            Sense = p.Sense,
            Winding = winding,
            ElementCount = layout.Count,
            ElementLengthMm = layout.LengthM * MmPerM,
            ElementRiseMm = layout.RiseM * MmPerM,
            // The former is centred on the elements: the model's centre height is measured from the
            // feed (dipole) or the ground (monopole); the fabrication files measure from the former's
            // bottom face.
            CentreHeightMm = heightMm / 2,
            WireDiameterMm = p.Wire.DiameterM * MmPerM,
            FormerOuterDiameterMm = layout.OuterDiameterM * MmPerM,
            FormerBoreDiameterMm = p.Former.BoreM * MmPerM,
            FormerHeightMm = heightMm,
            CoverDiameterMm = (design.Whip.CoverDiameterM ?? design.Whip.DiameterM) * MmPerM,
            FormerPrinted = p.Former.Material.Key is "pla" or "petg",
            FormerMaterial = p.Former.Material.Key,
            Whip = design.Whip.Kind,
            WhipLengthMm = design.Whip.LengthM * MmPerM,
            CentreAboveFeedMm = p.CentreHeightM * MmPerM,
            WrapMaterial = p.Wrap?.Material.Key ?? "none",
            WrapThicknessMm = p.Wrap is null ? 0 : p.Wrap.LayerThicknessM.Value * MmPerM,
            WrapLayers = p.Wrap?.Layers ?? 0,
            KerfMm = f.KerfMm,
            RingCount = f.Rings,
            BoardWidthMm = f.BoardWidthMm,
            BoardHeightMm = f.BoardHeightMm,
            BoardThicknessMm = f.BoardThicknessMm,
            PrintClearanceMm = f.PrintClearanceMm,
            Paper = f.Paper,
            Dpi = f.Dpi,
            LengthToleranceMm = cutToleranceMm is { } c && double.IsFinite(c.LengthMm) && c.LengthMm > 0 ? c.LengthMm : t.ElementLengthM * MmPerM,
            RiseToleranceMm = cutToleranceMm is { } r && double.IsFinite(r.RiseMm) && r.RiseMm > 0 ? r.RiseMm : t.ElementRiseM * MmPerM,
            ToleranceIsCutFigure = cutToleranceMm is { } k && double.IsFinite(k.LengthMm) && k.LengthMm > 0,
            FrequencyHz = design.Band.CenterHz,
            SummaryLines = summary ?? [],
            PlotPngs = plotPngs ?? [],
        };
    }
}
