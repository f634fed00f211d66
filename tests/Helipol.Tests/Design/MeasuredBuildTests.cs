using Helipol.Design;
using Helipol.Model;
using Xunit.Abstractions;

namespace Helipol.Tests.Design;

/// <summary>
/// The whole chain against a measured build of the trade (common practice, no source): a 5.8 GHz
/// whip received by a circularly polarized antenna; a 3-element foam-and-tape build at the practice
/// dimensions (about 16 mm elements, 12.7 mm rise, one PVC tape wrap) gave 1.6 dB more than the bare
/// whip, and the opposite winding 7-8 dB less than the right one. The design file is
/// data/designs/practice-foam-tape.yaml. The model's default loading (factor 1, the field solve)
/// does not reproduce the account; these tests hold the report's comparison row
/// (<see cref="CoatingCalibration.DefaultComparison"/>) to what the model says.
/// </summary>
public class MeasuredBuildTests(ITestOutputHelper output)
{
    private static readonly PolarizerDesign Practice = DesignFiles.Load("practice-foam-tape");
    private static readonly ObservationSet Horizon = ObservationSet.Cone(0, 5 * Math.PI / 180);

    private static (double Right, double Wrong, double Bare) Gains(double factor)
    {
        var build = CalibrationFit.PinnedBuild(Practice, factor);
        var s = PolarizerEvaluator.Evaluate(build, new[] { 5.8e9 }, Horizon, Sense.Rhcp)[0];
        var bare = PolarizerEvaluator.SampleBareWhip(WhipKind.Dipole, Practice.Whip.LengthM, Practice.Whip.RadiusM, new[] { 5.8e9 }, Horizon)[0].Summarize(Sense.Rhcp);
        // Mirror symmetry: the other winding's co-polar gain is this build's cross-polar gain.
        double right = Math.Max(s.GainRhcpDbic, s.GainLhcpDbic), wrong = Math.Min(s.GainRhcpDbic, s.GainLhcpDbic);
        return (right, wrong, bare.GainRhcpDbic);
    }

    // The disagreement the report states: at factor 1 the contrast falls well short of the account's 7-8 dB.
    [Fact]
    public void FieldSolvedLoadingFallsShortOfTheAccountsWindingContrast()
    {
        var (right, wrong, bare) = Gains(CoatingCalibration.DefaultFactor);
        output.WriteLine($"factor 1: contrast {right - wrong:0.0} dB, over bare {right - bare:0.0} dB");
        Assert.True(right - wrong < 7.0, $"contrast {right - wrong:0.0} dB");
        Assert.Contains($"predicts {right - wrong:0.0} dB and {SignedNumber.Format(right - bare, "0.0")} dB", CoatingCalibration.DefaultComparison);
    }

    // Not fitted to anything: the right winding beats the bare whip into a CP receiver. Measured
    // +1.6 dB; we accept the neighbourhood ±1.5 dB (the field model's gain, not its contrast, is the
    // part of the account it does reproduce).
    [Fact]
    public void FieldSolvedLoadingPredictsAGainOverTheBareWhipNearTheMeasuredOne()
    {
        var (right, _, bare) = Gains(CoatingCalibration.DefaultFactor);
        Assert.InRange(right - bare, 1.6 - 1.5, 1.6 + 1.5);
    }

    // The factor the account would need (7.5 dB, smallest factor) is the one the report quotes.
    [Fact]
    public void TheAccountNeedsTheFactorTheReportQuotes()
    {
        double fit = CalibrationFit.FitCoCrossRatio(Practice, 7.5, 5.8e9);
        output.WriteLine($"factor for 7.5 dB: {fit:0.00}");
        Assert.InRange(fit, CoatingCalibration.PracticeAccountFactor - 0.15, CoatingCalibration.PracticeAccountFactor + 0.15);
        var (right, wrong, _) = Gains(CoatingCalibration.PracticeAccountFactor);
        Assert.InRange(right - wrong, 7.0, 8.0);
    }
}
