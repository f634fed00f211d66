using Helipol.Model;
namespace Helipol.Geometry;

/// <summary>One line of the build packet's summary page.</summary>
public sealed record SummaryLine(string Key, string Value);

/// <summary>
/// Everything the fabrication set is made from: the solved element and the build settings, all in
/// millimetres. This is the neutral hand-over from the design to the geometry; nothing here knows
/// about the design file or the solver. Where a setting has a default, it is the design file's
/// default for the same key (held equal by a test), so a caller that leaves it out gets what a
/// design file that leaves it out gets.
/// </summary>
public sealed record PolarizerBuildInput
{
    public required string DesignName { get; init; }
    public required Sense Sense { get; init; }
    public required Winding Winding { get; init; }
    public required int ElementCount { get; init; }
    /// <summary>Total wire length of one element along the helix, mm.</summary>
    public required double ElementLengthMm { get; init; }
    /// <summary>Height one element climbs from its lower to its upper end, mm.</summary>
    public required double ElementRiseMm { get; init; }
    /// <summary>Height of the element's middle above the former's bottom face, mm.</summary>
    public required double CentreHeightMm { get; init; }
    public required double WireDiameterMm { get; init; }
    public required double FormerOuterDiameterMm { get; init; }
    public required double FormerBoreDiameterMm { get; init; }
    public required double FormerHeightMm { get; init; }
    /// <summary>Outside diameter of the whip's cover the former slides over, mm.</summary>
    public required double CoverDiameterMm { get; init; }
    /// <summary>True when the former is a printed sleeve (PLA, PETG) rather than a stack of foam rings.</summary>
    public bool FormerPrinted { get; init; }
    /// <summary>Name of the former's material, for the assembly steps.</summary>
    public string FormerMaterial { get; init; } = "foam";
    public WhipKind Whip { get; init; } = WhipKind.Dipole;
    /// <summary>Whip length (tip to tip for a dipole, ground to tip for a monopole), mm; 0 when not known.</summary>
    public double WhipLengthMm { get; init; }
    /// <summary>Height of the elements' middle above the feed gap (dipole) or the ground plane (monopole), mm.</summary>
    public double CentreAboveFeedMm { get; init; }
    public string WrapMaterial { get; init; } = "none";
    public double WrapThicknessMm { get; init; }
    public int WrapLayers { get; init; }
    /// <summary>Width of material the cutter removes, mm.</summary>
    public double KerfMm { get; init; } = 0.2;
    /// <summary>Number of foam rings stacked to make the former.</summary>
    public int RingCount { get; init; } = 6;
    public double BoardWidthMm { get; init; } = 300;
    public double BoardHeightMm { get; init; } = 200;
    public double BoardThicknessMm { get; init; } = 38;
    /// <summary>Clearance added to printed fits (bore over the cover, groove over the wire), mm.</summary>
    public double PrintClearanceMm { get; init; } = 0.2;
    /// <summary>Clearance added to the wire diameter for drilled holes, mm.</summary>
    public double DrillClearanceMm { get; init; } = 0.2;
    public Paper Paper { get; init; } = Paper.A4;
    public int Dpi { get; init; } = 300;
    public double LengthToleranceMm { get; init; } = 0.5;

    /// <summary>True when the length and rise tolerances are the tolerance analysis's "cut to within" figures, false when they are the design's assumed spreads.</summary>
    public bool ToleranceIsCutFigure { get; init; }
    public double RiseToleranceMm { get; init; } = 1;
    /// <summary>Design (centre) frequency, used on labels only.</summary>
    public double FrequencyHz { get; init; }
    public IReadOnlyList<SummaryLine> SummaryLines { get; init; } = [];
    /// <summary>Optional plots (PNG bytes) placed on the packet's summary pages.</summary>
    public IReadOnlyList<byte[]> PlotPngs { get; init; } = [];
}
