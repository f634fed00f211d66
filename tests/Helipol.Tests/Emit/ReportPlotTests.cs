using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Model;

namespace Helipol.Tests.Emit;

public class ReportPlotTests
{
    // Same results, same bytes: the report plots carry no date and use fixed sizes (PNG signature
    // and IHDR size per the PNG specification, ISO/IEC 15948 §5.2 and §11.2.2).
    [Fact]
    public void PolarPlotIsAPngOfFixedSizeAndRepeatsByteForByte()
    {
        var angles = Enumerable.Range(0, 72).Select(i => i * 5.0).ToArray();
        var cut = new PatternCut("azimuth", 5.8e9, angles, angles.Select(a => 2 * Math.Cos(a * Math.PI / 180)).ToArray(), angles.Select(_ => -6.0).ToArray());
        var a = ReportPlots.Polar(cut, "test");
        var b = ReportPlots.Polar(cut, "test");
        Assert.Equal(a, b);
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, a.Take(8).ToArray());
        int width = (a[16] << 24) | (a[17] << 16) | (a[18] << 8) | a[19];
        int height = (a[20] << 24) | (a[21] << 16) | (a[22] << 8) | a[23];
        Assert.Equal((ReportPlots.PolarSize, ReportPlots.PolarSize), (width, height));
    }

    [Fact]
    public void HeatMapLeavesUnbuildableCellsBlankAndRepeats()
    {
        var values = new double[3, 2] { { 10, double.NaN }, { 4, 6 }, { 12, 20 } };
        var map = new AxialRatioMap(3, 28e-3, new[] { 18e-3, 20e-3, 22e-3 }, new[] { 10e-3, 12e-3 }, values, new Winding[3, 2]);
        Assert.Equal(ReportPlots.AxialRatioMap(map, 20e-3, 10e-3, "t"), ReportPlots.AxialRatioMap(map, 20e-3, 10e-3, "t"));
        Assert.Equal((1, 0), map.Best());
    }

    // The AR axis was autoscaled below the 40 dB cap, so the curve ran off the top of ar-gain.png.
    // An axis set by hand must hold the highest value drawn, with room above it for the legend
    // (a third of the span, common practice, no source), on a 5-unit step.
    [Theory]
    [InlineData(40, 0)]
    [InlineData(3.1, 0)]
    [InlineData(5.13, 1)]
    [InlineData(3.2, -15.9)]
    [InlineData(-2, -12)]
    public void AxisTopHoldsTheDataWithRoomForTheLegend(double max, double low)
    {
        double top = ReportPlots.AxisTop(max, low);
        Assert.True(top >= low + 1.3 * (max - low), $"top {top} for data {low}..{max}");
        Assert.Equal(0, top % 5);
        Assert.True(top - (low + 1.35 * (max - low)) < 5);
    }
}
