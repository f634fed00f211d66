using Complex = System.Numerics.Complex;
using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class PolarizationTests
{
    // IEEE Std 145-2013 (definitions of terms for antennas): right-hand = clockwise rotation for an
    // observer looking in the direction of propagation. With e^{jωt} and θ̂ × φ̂ = r̂, a field
    // E_θ = 1, E_φ = −j rotates from θ̂ to φ̂ (clockwise seen along r̂): right-hand.
    [Fact]
    public void CircularComponentsFollowIeee145()
    {
        var rhcp = new FarField(1, -Complex.ImaginaryOne);
        Assert.Equal(PolarizationSense.Rhcp, Polarization.Sense(rhcp));
        Assert.Equal(0, rhcp.LeftHandV.Magnitude, 12);
        Assert.Equal(0, Polarization.AxialRatioDb(rhcp), 9);
        var lhcp = new FarField(1, Complex.ImaginaryOne);
        Assert.Equal(PolarizationSense.Lhcp, Polarization.Sense(lhcp));
        Assert.Equal(0, lhcp.RightHandV.Magnitude, 12);
    }

    // Linear fields: AR capped, sense linear; tilt is the angle of the field from θ̂ towards φ̂.
    [Fact]
    public void LinearFieldHasTiltAndNoSense()
    {
        var vertical = new FarField(1, 0);
        Assert.Equal(PolarizationSense.Linear, Polarization.Sense(vertical));
        Assert.Equal(Polarization.MaxAxialRatioDb, Polarization.AxialRatioDb(vertical));
        Assert.Equal(0, Polarization.TiltRad(vertical), 12);
        Assert.Equal(Math.PI / 2, Polarization.TiltRad(new FarField(0, 1)), 12);
        Assert.Equal(Math.PI / 4, Polarization.TiltRad(new FarField(1, 1)), 12);
        Assert.Equal(-Math.PI / 4, Polarization.TiltRad(new FarField(1, -1)), 12);
        // An ellipse with axes 2:1 along θ̂ and φ̂ has AR = 20 log10 2 (definition of axial ratio).
        Assert.Equal(20 * Math.Log10(2), Polarization.AxialRatioDb(new FarField(2, Complex.ImaginaryOne)), 9);
    }

    // Design note check: crossed dipoles along x and y with I_y = +j I_x radiate LHCP towards +z and
    // RHCP towards −z (IEEE Std 145 sense, e^{jωt}); swapping the phase swaps both. The dipoles are
    // 0.005 λ apart in z (they may not cross), which unbalances the on-axis phase by k·Δz = 1.8°, so the
    // axial ratio is 0.27 dB rather than 0: we allow 0.5 dB.
    [Theory]
    [InlineData(1.0, PolarizationSense.Lhcp, PolarizationSense.Rhcp)]
    [InlineData(-1.0, PolarizationSense.Rhcp, PolarizationSense.Lhcp)]
    public void CrossedDipolesInQuadratureAreCircular(double phase, PolarizationSense up, PolarizationSense down)
    {
        var model = Antennas.CrossedDipoles(phase);
        var s = Antennas.Solve(model);
        var top = s.GainAt(0, 0);
        var bottom = s.GainAt(Math.PI, 0);
        Assert.Equal(up, top.Sense);
        Assert.Equal(down, bottom.Sense);
        Assert.InRange(top.AxialRatioDb, 0, 0.5);
        Assert.InRange(bottom.AxialRatioDb, 0, 0.5);
        double co = up == PolarizationSense.Rhcp ? top.GainRhcpDbic : top.GainLhcpDbic;
        double cross = up == PolarizationSense.Rhcp ? top.GainLhcpDbic : top.GainRhcpDbic;
        Assert.True(co - cross > 25, $"co {co} dBic, cross {cross} dBic");
        // Total gain is the sum of the two circular parts (IEEE 145: partial gains add).
        Assert.Equal(top.GainTotalDbi, 10 * Math.Log10(Math.Pow(10, co / 10) + Math.Pow(10, cross / 10)), 9);
    }

    // Kraus, Antennas (2nd ed., §7-14), after Wheeler: a normal-mode helix (diameter D, turn spacing S,
    // both ≪ λ) radiates at broadside with AR = |E_θ|/|E_φ| = 2Sλ/(πD)². The formula assumes a uniform
    // current on each turn; a fed 4-turn helix of 0.38 λ wire is close to that, so we allow 6 %.
    [Fact]
    public void NormalModeHelixAxialRatioMatchesWheelerKraus()
    {
        const double d = 0.03, spacing = 0.015;
        const int turns = 4, perTurn = 16;
        var points = new List<Vector3>();
        for (int i = 0; i <= turns * perTurn; i++)
        {
            double t = 2 * Math.PI * i / perTurn;
            points.Add(new Vector3(d / 2 * Math.Cos(t), d / 2 * Math.Sin(t), spacing * i / perTurn));
        }
        var model = new WireModel(new[] { new Wire(points, 2e-4, PerfectConductor.Instance) }, GroundPlane.None,
            new[] { new VoltageSource(points[turns * perTurn / 2], 1) });
        var s = Antennas.Solve(model, options: new SegmentationOptions(20, 1));
        double expected = 2 * spacing / (Math.PI * d * Math.PI * d);
        for (int k = 0; k < 8; k++)
        {
            var f = s.FarFieldAt(Math.PI / 2, k * Math.PI / 4);
            Assert.InRange(f.EThetaV.Magnitude / f.EPhiV.Magnitude, expected * 0.94, expected * 1.06);
            Assert.Equal(20 * Math.Log10(f.EThetaV.Magnitude / f.EPhiV.Magnitude), s.GainAt(Math.PI / 2, k * Math.PI / 4).AxialRatioDb, 0.3);
        }
    }
}
