using Helipol.Design;

namespace Helipol.Tests.Verdict;

/// <summary>The coverage window's azimuth span: centred on azimuth 0, both ends sampled; a full turn as before.</summary>
public class CoverageWindowTests
{
    private const double Deg = Math.PI / 180;

    [Fact]
    public void ANarrowSpanIsCentredOnAzimuthZero()
    {
        var set = ObservationSet.Coverage(0, 0, 0, 5 * Deg, 90 * Deg);
        var az = set.Directions.Select(d => d.AzimuthRad / Deg).ToArray();
        Assert.Equal(19, az.Length); // −45° to 45° every 5°, both ends
        Assert.Equal(-45, az[0], 9);
        Assert.Equal(45, az[^1], 9);
        Assert.Equal(0, az[9], 9);
    }

    // A full span is the old window exactly (every 5° from 0, 72 azimuths), and with N identical
    // elements one period of 2π/N (the pattern repeats, an exact saving).
    [Fact]
    public void AFullSpanIsTheWholeTurnOrOnePeriod()
    {
        var full = ObservationSet.Coverage(-30 * Deg, 30 * Deg, 10 * Deg, 5 * Deg, 2 * Math.PI);
        Assert.Equal(7 * 72, full.Directions.Count);
        var period = ObservationSet.Coverage(-30 * Deg, 30 * Deg, 10 * Deg, 5 * Deg, 2 * Math.PI, 2 * Math.PI / 6);
        Assert.Equal(7 * 12, period.Directions.Count);
        Assert.Equal(ObservationSet.Window(-30 * Deg, 30 * Deg, 10 * Deg, 5 * Deg).Directions, full.Directions);
    }

    // The axial ratio from circular amplitudes (IEEE Std 145): |E_R| = 1, |E_L| = 0.5 gives (1.5/0.5) = 3,
    // 9.54 dB, in either order; equal amplitudes are a linear field.
    [Fact]
    public void TrueAxialRatioFromGains()
    {
        Assert.Equal(20 * Math.Log10(3), TrueAxialRatio.FromPowerGainsDb(1, 0.25), 12);
        Assert.Equal(20 * Math.Log10(3), TrueAxialRatio.FromPowerGainsDb(0.25, 1), 12);
        Assert.Equal(Helipol.Engine.PolarizationSense.Lhcp, TrueAxialRatio.SenseOf(0.25, 1));
        Assert.Equal(Helipol.Engine.PolarizationSense.Linear, TrueAxialRatio.SenseOf(1, 1));
    }
}
