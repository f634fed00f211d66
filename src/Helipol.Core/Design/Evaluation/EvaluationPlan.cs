using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// What one evaluation of a geometry covers, from the design's <c>solve:</c> block: the
/// frequencies across the band (evenly spaced, edges included) and the directions (the elevation
/// window × azimuth steps).
/// </summary>
public sealed record EvaluationPlan(IReadOnlyList<double> FrequenciesHz, ObservationSet Directions, Sense Sense, Objective Objective, double GainWeight)
{
    /// <summary>
    /// The plan the search and the final report use. With identical, evenly spaced elements the
    /// pattern repeats every 2π/N in azimuth, so <paramref name="elementCount"/> lets the search
    /// sample one period only (an exact saving, not an approximation); pass null for a full turn.
    /// </summary>
    public static EvaluationPlan ForDesign(PolarizerDesign design, int? elementCount = null)
    {
        var s = design.Solve;
        double period = elementCount is { } n ? 2 * Math.PI / n : 2 * Math.PI;
        return new EvaluationPlan(BandFrequencies(design.Band, s.FrequencyCount),
            ObservationSet.Coverage(s.ElevationFromRad, s.ElevationToRad, s.ElevationStepRad, s.AzimuthStepRad, s.AzimuthSpanRad, period),
            design.Polarizer.Sense, s.Objective, s.GainWeight);
    }

    /// <summary>
    /// The lighter plan the search scores candidates with, to stay near 2 s per design on two
    /// cores: at most three frequencies (low, centre, high), elevations at least 10° apart across
    /// the same window, and one azimuth period (2π/N). The chosen geometry is then re-evaluated with
    /// the full plan of <see cref="ForDesign"/>.
    /// </summary>
    public static EvaluationPlan ForSearch(PolarizerDesign design, int elementCount)
    {
        var s = design.Solve;
        return new EvaluationPlan(BandFrequencies(design.Band, Math.Min(3, s.FrequencyCount)),
            ObservationSet.Coverage(s.ElevationFromRad, s.ElevationToRad, Math.Max(s.ElevationStepRad, SearchElevationStepRad), s.AzimuthStepRad, s.AzimuthSpanRad, 2 * Math.PI / elementCount),
            design.Polarizer.Sense, s.Objective, s.GainWeight);
    }

    /// <summary>Coarsest elevation step the search uses, rad (10°).</summary>
    public const double SearchElevationStepRad = 10 * Math.PI / 180;

    /// <summary><paramref name="count"/> frequencies from low to high (the centre alone when count is 1).</summary>
    public static double[] BandFrequencies(Band band, int count) => count <= 1
        ? new[] { band.CenterHz }
        : Enumerable.Range(0, count).Select(i => band.LowHz + (band.HighHz - band.LowHz) * i / (count - 1)).ToArray();

    public double ObjectiveOf(IReadOnlyList<FrequencySummary> points, Sense sense) => DesignObjective.Value(points, Objective, GainWeight, sense);
}
