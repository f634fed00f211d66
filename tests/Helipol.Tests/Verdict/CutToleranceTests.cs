using Helipol.Design;

namespace Helipol.Tests.Verdict;

/// <summary>
/// The cut tolerance rests on the distribution of a sum of two uniform errors (a trapezoid, the
/// convolution of two rectangles; any probability text, e.g. Papoulis, ch. 6). The quantile is checked
/// against a plain Monte Carlo count, and the tolerance against the margin arithmetic by hand.
/// </summary>
public class CutToleranceTests
{
    [Theory]
    [InlineData(1.0, 0.0)]
    [InlineData(1.0, 0.3)]
    [InlineData(1.0, 1.0)]
    [InlineData(2.0, 0.5)]
    public void TheQuantileMatchesACount(double a, double b)
    {
        double q = CutTolerance.Quantile(a, b, 0.9);
        var rng = new Random(7);
        int n = 200000, inside = 0;
        for (int i = 0; i < n; i++)
            if (Math.Abs(a * (2 * rng.NextDouble() - 1) + b * (2 * rng.NextDouble() - 1)) <= q) inside++;
        Assert.Equal(0.9, inside / (double)n, 2);
    }

    // Length alone (no rise slope): 90 % of U(−t, t) lies within 0.9 t, so the shift s·0.9·t must equal
    // the margin d: with best AR 5 MHz above a band edge 10 MHz away on the other side, d = 5 MHz,
    // s = −100 MHz/mm → t = 5 / (0.9 · 100) = 0.0556 mm.
    [Fact]
    public void LengthAloneByHand()
    {
        var (len, rise) = CutTolerance.For(5.79e9, 5.81e9, 5.805e9, -100, 0, 0.5, 1.0);
        Assert.Equal(5.0 / 90, len, 9);
        Assert.Equal(2 * 5.0 / 90, rise, 9);
    }

    [Fact]
    public void ABestAxialRatioOutsideTheBandHasNoTolerance()
    {
        Assert.Equal((0.0, 0.0), CutTolerance.For(5.79e9, 5.81e9, 5.9e9, -100, 10, 0.5, 1.0));
        Assert.True(double.IsNaN(CutTolerance.For(5.79e9, 5.81e9, double.NaN, -100, 10, 0.5, 1.0).LengthMm));
    }
}
