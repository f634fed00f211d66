using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The result of solving one design, as one record the later stages (geometry, fabrication files,
/// report) take as is: the chosen geometry in SI units, the sense it gives, how well, what the
/// practice rule would have given, and how the search got there.
/// </summary>
public sealed record SolvedPolarizer(
    string Name,
    Sense Sense,
    PolarizerBuild Build,
    ElementLayout Layout,
    Winding Winding,
    CoatingCalibration Calibration,
    double ObjectiveDb,
    IReadOnlyList<FrequencySummary> Points,
    PracticeComparison Practice,
    SearchOutcome Search,
    long FieldSolves)
{
    /// <summary>The element loading of the solved build (added inductance, layer shares, shortening); null when not worked out.</summary>
    public Helipol.Design.Loading.LoadingSummary? Loading { get; init; }

    /// <summary>The bare whip at the same frequencies and directions as <see cref="Points"/>, for the verdict's comparison.</summary>
    public IReadOnlyList<FrequencySummary> BareWhip { get; init; } = Array.Empty<FrequencySummary>();

    /// <summary>The point whose deciding direction is worst for the wanted sense (largest search score).</summary>
    public FrequencySummary WorstPoint => Points.MaxBy(p => p.WorstScoreDb)!;

    /// <summary>Worst true axial ratio in the wanted sense over the band and coverage window, dB; +∞ when some direction has the wrong sense.</summary>
    public double WorstAxialRatioDb => Points.Max(p => p.WorstWantedAxialRatioDb);

    /// <summary>Mean gain in the wanted sense over the band and window, dBic.</summary>
    public double MeanGainDbic => CircularSamples.Db(Points.Average(p => Math.Pow(10, p.GainDbic(Sense) / 10)));

    /// <summary>Mean realized gain in the wanted sense over the band and window, dBic.</summary>
    public double MeanRealizedGainDbic => CircularSamples.Db(Points.Average(p => Math.Pow(10, p.RealizedGainDbic(Sense) / 10)));

    /// <summary>Which key values came from the design file rather than the search.</summary>
    public bool LengthPinned { get; init; }
    public bool RisePinned { get; init; }
    public bool CountPinned { get; init; }
    public bool DiameterPinned { get; init; }
    public bool WindingPinned { get; init; }
}

/// <summary>The practice-scaling layout (pinned values kept) evaluated the same way, for comparison.</summary>
public sealed record PracticeComparison(ElementLayout Layout, Winding Winding, double? ObjectiveDb, IReadOnlyList<FrequencySummary> Points, string? Problem);
