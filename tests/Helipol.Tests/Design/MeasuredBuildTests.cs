using Helipol.Design;
using Helipol.Model;

namespace Helipol.Tests.Design;

/// <summary>
/// The whole chain against a measured build of the trade (common practice, no source): a 5.8 GHz
/// whip received by a circularly polarized antenna; a 3-element foam-and-tape build at the practice
/// dimensions (about 16 mm elements, 12.7 mm rise, one PVC tape wrap) gave 1.6 dB more than the bare
/// whip, and the opposite winding 7-8 dB less than the right one. The design file is
/// data/designs/practice-foam-tape.yaml. The default calibration was fitted to the 7-8 dB (and
/// only to that); the gain over the bare whip is a separate prediction.
/// </summary>
public class MeasuredBuildTests
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

    [Fact]
    public void DefaultCalibrationReproducesTheWindingContrastItWasFittedTo()
    {
        var (right, wrong, _) = Gains(CoatingCalibration.DefaultFactor);
        Assert.InRange(right - wrong, 7.0, 8.0);
        // And the constant is what the stated fit gives (7.5 dB, smallest factor).
        Assert.InRange(CalibrationFit.FitCoCrossRatio(Practice, 7.5, 5.8e9), CoatingCalibration.DefaultFactor - 0.15, CoatingCalibration.DefaultFactor + 0.15);
    }

    // Prediction not used in the fit: the right winding beats the bare whip into a CP receiver.
    // Measured +1.6 dB; the model says about +2.7 dB. We accept the neighbourhood ±1.5 dB and report
    // the difference (README, "The solver").
    [Fact]
    public void CalibratedModelPredictsAGainOverTheBareWhipNearTheMeasuredOne()
    {
        var (right, _, bare) = Gains(CoatingCalibration.DefaultFactor);
        Assert.InRange(right - bare, 1.6 - 1.5, 1.6 + 1.5);
    }

    // The published coated-wire model alone (factor 1) explains much less: the practice length sits
    // far below the free-space optimum near 0.4 λ (about 20-21 mm), so the contrast is small.
    [Fact]
    public void UncalibratedModelPredictsAWeakerEffectAtSixteenMillimetres()
    {
        var (right, wrong, _) = Gains(1);
        Assert.True(right - wrong < 3, $"uncalibrated contrast {right - wrong:0.0} dB");
    }
}
