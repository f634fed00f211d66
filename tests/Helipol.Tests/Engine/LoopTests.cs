using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class LoopTests
{
    // Balanis, Antenna Theory, 3rd ed., eq. 5-24: a small loop with a uniform current has
    // R = 20π²(C/λ)⁴ = 320π⁴(A/λ²)²; radiation depends on the enclosed area only, so the polygon's own
    // area is used. A fed loop's current is uniform only as C/λ → 0: the remaining variation radiates as
    // an electric dipole and adds a relative excess that grows as (C/λ)². We check 2 % at C = 0.025 λ and
    // that the excess at C = 0.05 λ is about four times it.
    [Fact]
    public void SmallLoopMatchesUniformCurrentFormula()
    {
        double Excess(double circumference)
        {
            const int sides = 48;
            double b = circumference / (2 * Math.PI);
            var s = Antennas.Solve(Antennas.PolygonLoop(b, sides, 1e-5), options: new SegmentationOptions(20, 1));
            double area = Antennas.PolygonArea(b, sides);
            return s.InputImpedanceOhm().Real / (320 * Math.Pow(Math.PI, 4) * area * area) - 1;
        }
        double small = Excess(0.025), larger = Excess(0.05);
        Assert.InRange(small, -0.02, 0.02);
        Assert.InRange(larger / small, 3.0, 5.5);
    }

    // Balanis §5.2: a small loop's pattern is sin θ in E_φ only, directivity 1.5.
    [Fact]
    public void SmallLoopRadiatesEPhiWithDirectivity1_5()
    {
        var s = Antennas.Solve(Antennas.PolygonLoop(0.025 / (2 * Math.PI), 48, 1e-5), options: new SegmentationOptions(20, 1));
        Assert.Equal(1.5, s.DirectivityAt(Math.PI / 2, 0.4), 0.02);
        var f = s.FarFieldAt(Math.PI / 2, 0.4);
        Assert.True(f.EThetaV.Magnitude < 0.1 * f.EPhiV.Magnitude);
    }
}
