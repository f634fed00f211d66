using Helipol.Design;

namespace Helipol.Tests.Design;

/// <summary>
/// An optimum found on the boundary of a bounded search is only a constrained optimum (the
/// Karush–Kuhn–Tucker conditions hold with an active bound, Nocedal and Wright, Numerical
/// Optimization, ch. 12): the report must say which searched quantity sits on a limit.
/// </summary>
public class SearchLimitTests
{
    private static readonly int[] Counts = { 4, 5, 6 };
    private static readonly double[] Diameters = { 46.59e-3, 69.89e-3, 93.18e-3 };
    private static readonly double[] Lengths = PolarizerSearch.Spread(20e-3, 40e-3, 9);
    private static readonly double[] Rises = PolarizerSearch.Spread(10e-3, 30e-3, 9);

    [Fact]
    public void AnInteriorOptimumReachesNoLimit()
    {
        var found = PolarizerSearch.LimitsReached(Counts, Diameters, Lengths, Rises, 5, 69.89e-3, 31e-3, 19e-3, 0.5e-3, true, true, 35e-3);
        Assert.Empty(found);
    }

    // The farm-survey case: the search's smallest diameter (0.7 × the practice diameter) won.
    [Fact]
    public void TheSmallestDiameterSearchedIsFlagged()
    {
        var found = PolarizerSearch.LimitsReached(Counts, Diameters, Lengths, Rises, 5, 46.59e-3, 31e-3, 19e-3, 0.5e-3, true, true, 35e-3);
        var line = Assert.Single(found);
        Assert.Contains("former diameter 46.59 mm is the smallest searched", line);
    }

    [Fact]
    public void CountLengthAndRiseAtTheirEndsAreFlagged()
    {
        var found = PolarizerSearch.LimitsReached(Counts, Diameters, Lengths, Rises, 6, 69.89e-3, 40.1e-3, 30e-3, 0.5e-3, true, true, 30e-3);
        Assert.Equal(3, found.Count);
        Assert.Contains("element count 6 is the most searched", found[0]);
        Assert.Contains("element length 40.1 mm is at the long end", found[1]);
        Assert.Contains("largest the former height allows", found[2]);
    }

    // A pinned quantity was never searched, so it cannot sit on a search limit.
    [Fact]
    public void PinnedQuantitiesAreNeverFlagged()
    {
        var found = PolarizerSearch.LimitsReached(new[] { 3 }, new[] { 28e-3 }, new[] { 16e-3 }, new[] { 12.7e-3 }, 3, 28e-3, 16e-3, 12.7e-3, 0.2e-3, false, false, 14e-3);
        Assert.Empty(found);
    }
}
