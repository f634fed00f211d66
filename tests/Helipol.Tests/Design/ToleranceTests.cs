using Helipol.Design;
using Helipol.Model;

namespace Helipol.Tests.Design;

public class ToleranceTests
{
    private static readonly PolarizerDesign Design = DesignFiles.Load("pec-air-search");

    private static PolarizerBuild Nominal => PolarizerBuild.From(Design, 3, 20.8e-3, 12e-3, 28e-3, Winding.Left, 1);

    // Every build's perturbations are drawn up front from one seeded generator, so two runs give the
    // same builds and the same results whatever the scheduling of threads.
    [Fact]
    public void MonteCarloIsRepeatable()
    {
        var a = ToleranceAnalysis.Run(Design, Nominal, builds: 12);
        var b = ToleranceAnalysis.Run(Design, Nominal, builds: 12);
        Assert.Equal(a.WorstArDbByBuild, b.WorstArDbByBuild);
        Assert.Equal(a.TrimmingHint, b.TrimmingHint);
        Assert.InRange(a.Yield, 0, 1);
        Assert.True(a.ArP10Db <= a.ArP50Db && a.ArP50Db <= a.ArP90Db);
    }

    // Longer elements resonate lower, so their best-AR frequency falls as length grows (a wire
    // resonates near half a wavelength: common antenna knowledge, Balanis §4.6), and trimming moves it up.
    [Fact]
    public void LongerElementsMoveTheBestAxialRatioDown()
    {
        double lo = ToleranceAnalysis.BestArFrequencyHz(Design, Nominal.WithElements(3, 20.3e-3, 12e-3));
        double hi = ToleranceAnalysis.BestArFrequencyHz(Design, Nominal.WithElements(3, 21.3e-3, 12e-3));
        Assert.True(double.IsFinite(lo) && double.IsFinite(hi));
        Assert.True(hi < lo, $"{lo / 1e6:0} MHz at 20.3 mm, {hi / 1e6:0} MHz at 21.3 mm");
    }

    // Nearest-rank percentile (NIST/SEMATECH e-Handbook of Statistical Methods, §7.2.6.2, one of the standard definitions).
    [Theory]
    [InlineData(0.1, 1)]
    [InlineData(0.5, 5)]
    [InlineData(0.9, 9)]
    public void PercentileIsNearestRank(double p, double expected) =>
        Assert.Equal(expected, ToleranceAnalysis.Percentile(new double[] { 1, 2, 3, 4, 5, 6, 7, 8, 9, 10 }, p));
}
