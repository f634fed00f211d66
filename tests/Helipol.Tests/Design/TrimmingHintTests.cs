using System.Globalization;
using System.Text.RegularExpressions;
using Helipol.Design;

namespace Helipol.Tests.Design;

/// <summary>
/// The trimming hint is a first-order step on the best-AR frequency's slope against element length:
/// ΔL = (f_centre − f_best) / slope. The expected changes below are that arithmetic done by hand.
/// Longer elements resonate lower (a wire resonates near half a wavelength, Balanis §4.6), so the
/// slope is negative and a best AR below the centre asks for a trim.
/// </summary>
public class TrimmingHintTests
{
    [Fact]
    public void ABestArBelowTheCentreAsksForATrim()
    {
        // (5800 − 5700) MHz / (−100 MHz/mm) = −1 mm: trim 1 mm.
        var a = TrimmingHint.For(5.8e9, 5.7e9, -100, 0.2, 1.5);
        Assert.Equal(-1.0, a.LengthChangeMm, 9);
        Assert.StartsWith("trim 1.00 mm off every element", a.Text);
        Assert.Contains("moves it up", a.Text);
        Assert.DoesNotContain("tolerance", a.Text);
        Assert.Equal("trim every element 1.00 mm (best AR 5700 MHz)", a.Summary);
    }

    [Fact]
    public void ABestArAboveTheCentreAsksForLongerElements()
    {
        // (915 − 925) MHz / (−8.4 MHz/mm) = +1.19 mm, beyond a ±1 mm tolerance.
        var a = TrimmingHint.For(915e6, 925e6, -8.4, 1.27, 1.0);
        Assert.Equal(10 / 8.4, a.LengthChangeMm, 9);
        Assert.StartsWith("cut the elements 1.19 mm longer", a.Text);
        Assert.Contains("moves it down", a.Text);
        Assert.Contains("more than the ±1 mm length tolerance", a.Text);
        Assert.DoesNotContain("trim 1", a.Text);
        Assert.StartsWith("lengthen every element 1.19 mm", a.Summary);
    }

    // A best AR 26 MHz above 5800 MHz at −381 MHz/mm needs 0.07 mm: below half of a 0.2 mm trim, so
    // the hint must not tell the builder to cut (and never to trim when the best is above the centre).
    [Fact]
    public void AChangeUnderHalfTheFinestTrimIsNotACut()
    {
        var a = TrimmingHint.For(5.8e9, 5.826e9, -381.2, 0.2, 0.5);
        Assert.StartsWith("no trimming needed", a.Text);
        Assert.Contains("26 MHz above", a.Text);
    }

    [Fact]
    public void NoMinimumGivesNoHint()
    {
        var a = TrimmingHint.For(5.8e9, double.NaN, double.NaN, 0.2, 0.5);
        Assert.True(double.IsNaN(a.LengthChangeMm));
        Assert.StartsWith("no trimming hint", a.Text);
    }

    // The printed figures must multiply out: slope × change = offset to within the printed rounding
    // (half a unit of each printed last digit).
    [Theory]
    [InlineData(915e6, 919.2e6, -8.4)]
    [InlineData(2.44e9, 2.4457e9, -80.3)]
    [InlineData(1.28e9, 1.2711e9, -16.2)]
    [InlineData(5.8e9, 5.61e9, -381.2)]
    public void ThePrintedFiguresMultiplyOut(double centre, double best, double slope)
    {
        var text = TrimmingHint.For(centre, best, slope, 0.01, 10).Text;
        double Num(string pattern) => double.Parse(Regex.Match(text, pattern).Groups[1].Value.Replace('−', '-'), CultureInfo.InvariantCulture);
        double offset = Num(@", ([0-9.]+) MHz (?:above|below)");
        double printedSlope = Num(@"at ([+−][0-9.]+) MHz per mm");
        double change = Num(@"([0-9.]+) mm (?:shorter|longer) moves");
        Assert.InRange(Math.Abs(printedSlope) * change, offset - 0.05 - Math.Abs(printedSlope) * 0.005 - 0.05 * change, offset + 0.05 + Math.Abs(printedSlope) * 0.005 + 0.05 * change);
    }
}
