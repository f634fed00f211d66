using Helipol.Design;

namespace Helipol.Tests.Design;

public class SweepTests
{
    // The 3 dB edges of a parabola AR = (f − 100)²/10 cross 3 at f = 100 ± √30 exactly; the linear
    // interpolation on a fine grid must land within the grid error.
    [Fact]
    public void BandwidthEdgesInterpolateTheThreeDecibelCrossing()
    {
        var f = Enumerable.Range(0, 201).Select(i => 80 + 0.2 * i).ToArray();
        var ar = f.Select(x => (x - 100) * (x - 100) / 10).ToArray();
        var (lo, hi) = BandSweep.Bandwidth(f, ar, 100, 3);
        Assert.Equal(100 - Math.Sqrt(30), lo, 2);
        Assert.Equal(100 + Math.Sqrt(30), hi, 2);
    }

    [Fact]
    public void NoBandwidthWhenTheBestIsAboveThreeDecibels()
    {
        var (lo, hi) = BandSweep.Bandwidth(new[] { 1.0, 2, 3 }, new[] { 5.0, 4, 6 }, 1, 3);
        Assert.Equal(lo, hi);
    }
}
