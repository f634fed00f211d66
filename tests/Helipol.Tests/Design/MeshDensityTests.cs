using Helipol.Design;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Tests.Design;

/// <summary>
/// One design, one mesh. A moment-method answer depends a little on the segment length (it converges
/// as segments shrink, Harrington, Field Computation by Moment Methods, ch. 4), so a frequency asked on
/// its own and the same frequency inside a wider range must be solved on the same segments, or one
/// report prints two impedances and two VSWRs for one frequency.
/// </summary>
public class MeshDensityTests
{
    private static readonly PolarizerDesign Design = DesignFiles.Load("practice-foam-tape");
    private static readonly ObservationSet Horizon = ObservationSet.Cone(0, 5 * Math.PI / 180);
    private static PolarizerBuild Build => CalibrationFit.PinnedBuild(Design, CoatingCalibration.DefaultFactor);

    // 5.8 GHz alone (as `analyze --freq 5.8GHz` asks it) and as the middle of 5.3-6.3 GHz (as
    // `analyze --from 5.3GHz --to 6.3GHz` asks it) must be the same solution.
    [Fact]
    public void AFrequencyAloneAndInsideARangeGiveTheSameAnswer()
    {
        var alone = PolarizerEvaluator.Evaluate(Build, new[] { 5.8e9 }, Horizon, Sense.Rhcp)[0];
        var range = Enumerable.Range(0, 11).Select(i => 5.3e9 + 1e9 * i / 10).ToArray();
        Assert.Equal(5.8e9, range[5]);
        var inside = PolarizerEvaluator.Evaluate(Build, range, Horizon, Sense.Rhcp)[5];
        Assert.Equal(alone.ImpedanceOhm, inside.ImpedanceOhm);
        Assert.Equal(alone.MaxAxialRatioDb, inside.MaxAxialRatioDb);
    }

    // The band table (band frequencies only) and the sweep (band ± span) meet at the centre: the
    // polarizer and the bare whip must read the same there.
    [Fact]
    public void TheBandTableAndTheSweepAgreeAtTheCentre()
    {
        var sweep = BandSweep.Run(Design, Build, points: 3);
        var mid = sweep.Points[1];
        var table = PolarizerEvaluator.Evaluate(Build, new[] { mid.Polarizer.FrequencyHz }, Horizon, Sense.Rhcp)[0];
        Assert.Equal(table.ImpedanceOhm, mid.Polarizer.ImpedanceOhm);
        var bare = PolarizerEvaluator.SampleBareWhip(Design.Whip.Kind, Design.Whip.LengthM, Design.Whip.RadiusM, new[] { mid.Polarizer.FrequencyHz },
            Horizon, meshFrequencyHz: Build.MeshFrequencyHz)[0].Summarize(Sense.Rhcp);
        Assert.Equal(bare.Vswr50, mid.BareWhipVswr50);
    }

    // Every variant of a build made from the design (search candidates, tolerance builds) keeps the
    // design's mesh frequency, the top of its default sweep.
    [Fact]
    public void VariantsKeepTheDesignsMeshFrequency()
    {
        double expected = Design.Band.HighHz + Design.Solve.Sweep.SpanFraction * Design.Band.CenterHz;
        Assert.Equal(expected, Build.MeshFrequencyHz);
        Assert.Equal(expected, Build.WithElements(5, 15e-3, 10e-3).Mirrored().MeshFrequencyHz);
    }
}
