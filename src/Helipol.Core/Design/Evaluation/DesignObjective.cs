using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The number the search minimizes, from the design's <c>solve:</c> block: the worst (or mean)
/// axial-ratio score in the wanted sense over every frequency and direction, minus
/// <c>gain_weight</c> × the mean gain in the wanted sense (dBic), so 1 dB of gain is worth
/// <c>gain_weight</c> dB of axial ratio.
/// </summary>
public static class DesignObjective
{
    public static double Value(IReadOnlyList<FrequencySummary> points, Objective objective, double gainWeight, Sense sense)
    {
        double ar = objective == Objective.MeanAxialRatio ? points.Average(p => p.MeanScoreDb) : points.Max(p => p.WorstScoreDb);
        if (gainWeight == 0) return ar;
        double meanGain = points.Average(p => Math.Pow(10, p.GainDbic(sense) / 10));
        return ar - gainWeight * CircularSamples.Db(meanGain);
    }
}
