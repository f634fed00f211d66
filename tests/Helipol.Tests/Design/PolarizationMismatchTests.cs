using System.Numerics;
using Helipol.Design.Mismatch;

namespace Helipol.Tests.Design;

public class PolarizationMismatchTests
{
    // Limits of the general loss-factor formula (Stutzman, Polarization in Electromagnetic Systems, ch. 4;
    // also Balanis, Antenna Theory, 3rd ed., §2.12.2): linear–linear cos²Δτ, same-hand circular 1,
    // opposite-hand circular 0, linear–circular 1/2.
    [Theory]
    [InlineData(0, 1.0)]
    [InlineData(30, 0.75)]
    [InlineData(45, 0.5)]
    [InlineData(90, 0.0)]
    public void LinearToLinearIsCosineSquaredOfTiltDifference(double tiltDeg, double expected) =>
        Assert.Equal(expected, PolarizationMismatch.LossFactor(PolarizationState.Linear(0), PolarizationState.Linear(tiltDeg)), 12);

    [Fact]
    public void SameHandCircularIsMatched() =>
        Assert.Equal(1.0, PolarizationMismatch.LossFactor(PolarizationState.Rhcp(), PolarizationState.Rhcp(0, 37)), 12);

    [Fact]
    public void OppositeHandCircularIsBlocked() =>
        Assert.Equal(0.0, PolarizationMismatch.LossFactor(PolarizationState.Rhcp(), PolarizationState.Lhcp()), 12);

    // A linear whip against a CP partner loses about 3 dB: common practice, no source; textbook
    // value 1/2 = −3.01 dB (Balanis §2.12.2).
    [Theory]
    [InlineData(0)]
    [InlineData(60)]
    public void LinearToCircularIsHalfWhateverTheTilt(double tiltDeg)
    {
        Assert.Equal(0.5, PolarizationMismatch.LossFactor(PolarizationState.Linear(tiltDeg), PolarizationState.Lhcp()), 12);
        Assert.Equal(3.0103, PolarizationMismatch.LossDb(PolarizationState.Linear(tiltDeg), PolarizationState.Rhcp()), 4);
    }

    // Worked example (Balanis, Antenna Theory, 3rd ed., Example 2.8, from memory): a wave polarized
    // along x̂ received by an antenna polarized along (x̂ + ŷ)/√2 gives PLF = 0.5 (−3 dB).
    [Fact]
    public void LinearAt45DegreesLosesThreeDecibels() =>
        Assert.Equal(3.0103, PolarizationMismatch.LossDb(PolarizationState.Linear(0), PolarizationState.Linear(45)), 4);

    // Independent route: the loss factor equals |ρ_w · ρ_a*|² for unit Jones vectors when both
    // are written in one frame (Balanis §2.12.2 eq. 2-71). An ellipse of axial ratio r, tilt τ and
    // hand h has the Jones vector R(τ)·(1, ±j/r)/norm; the receiving antenna's vector is the
    // conjugate-matched one, i.e. the same vector for the same state. We build both from scratch
    // and compare with the closed form over a grid of states.
    [Fact]
    public void ClosedFormAgreesWithJonesVectorProjection()
    {
        var states = new List<PolarizationState>();
        foreach (var ar in new[] { 0.0, 1.0, 3.0, 10.0, 25.0 })
            foreach (var tilt in new[] { 0.0, 20.0, 65.0, 135.0 })
            {
                states.Add(PolarizationState.Rhcp(ar, tilt));
                states.Add(PolarizationState.Lhcp(ar, tilt));
            }
        states.Add(PolarizationState.Linear(10));
        foreach (var a in states)
            foreach (var b in states)
            {
                var expected = JonesProjection(a, b);
                Assert.Equal(expected, PolarizationMismatch.LossFactor(a, b), 9);
            }
    }

    [Fact]
    public void RangeOverTiltBracketsEveryTilt()
    {
        var a = PolarizationState.Rhcp(6);
        var b = PolarizationState.Rhcp(4);
        var (best, worst) = PolarizationMismatch.LossFactorRangeOverTilt(a, b);
        for (var t = 0; t < 180; t += 5)
        {
            var f = PolarizationMismatch.LossFactor(a, b with { TiltDeg = t });
            Assert.InRange(f, worst - 1e-12, best + 1e-12);
        }
    }

    [Theory]
    [InlineData("rhcp", PolarizationHand.Right, 0, 0)]
    [InlineData("lhcp:1.5dB", PolarizationHand.Left, 1.5, 0)]
    [InlineData("RHCP:3dB@20deg", PolarizationHand.Right, 3, 20)]
    [InlineData("linear@45deg", PolarizationHand.Linear, double.PositiveInfinity, 45)]
    public void ParsesTheCommandLineNotation(string text, PolarizationHand hand, double arDb, double tiltDeg)
    {
        var s = PolarizationState.Parse(text);
        Assert.Equal(hand, s.Hand);
        Assert.Equal(arDb, s.AxialRatioDb);
        Assert.Equal(tiltDeg, s.TiltDeg);
    }

    [Theory]
    [InlineData("circular")]
    [InlineData("rhcp:1.5")]
    [InlineData("rhcp:-2dB")]
    [InlineData("linear:3dB")]
    [InlineData("rhcp:NaNdB")]
    public void RefusesMalformedNotation(string text) =>
        Assert.Throws<FormatException>(() => PolarizationState.Parse(text));

    private static double JonesProjection(PolarizationState a, PolarizationState b)
    {
        var va = Jones(a);
        var vb = Jones(b);
        var dot = va.X * Complex.Conjugate(vb.X) + va.Y * Complex.Conjugate(vb.Y);
        return dot.Magnitude * dot.Magnitude;
    }

    private static (Complex X, Complex Y) Jones(PolarizationState s)
    {
        // Major axis along x, minor along y with a quarter-cycle lag whose sign sets the hand.
        var minor = s.Hand == PolarizationHand.Linear ? 0 : 1 / s.AxialRatio;
        var sign = s.Hand == PolarizationHand.Left ? -1 : 1;
        Complex x = 1, y = new Complex(0, sign * minor);
        var n = Math.Sqrt(1 + minor * minor);
        x /= n; y /= n;
        var t = s.TiltDeg * Math.PI / 180;
        return (x * Math.Cos(t) - y * Math.Sin(t), x * Math.Sin(t) + y * Math.Cos(t));
    }
}
