using Complex = System.Numerics.Complex;
using Helipol.Engine;
using Helipol.Engine.Kernel;

namespace Helipol.Tests.Engine;

public class QuadratureTests
{
    // Closed form of the static self term on a straight segment (elementary; Gradshteyn and Ryzhik 2.271):
    // S(b) = ∫₀ᴸ∫₀ᴸ dz dz' / sqrt((z − z')² + b²) = 2[L asinh(L/b) − sqrt(L² + b²) + b].
    // A segment's self pair lies on its own tube, so the engine takes the exact tube kernel there,
    // b² = 4a² sin²(φ/2) averaged over φ: I00 = (1/π)∫₀^π S(2a sin(φ/2)) dφ / L². The reference does that
    // last integral by MathNet's adaptive double-exponential rule, which handles the logarithm at φ = 0
    // on its own; the engine (closed form over one segment, outer end-clustered Gauss–Legendre, φ by
    // Gauss–Legendre after φ = πt²) must match to 1e-4 at k → 0, where the smooth remainder vanishes.
    // The wire's ends are open so that every segment has the length asked for.
    [Theory]
    [InlineData(0.05, 0.0125)]
    [InlineData(0.05, 1e-3)]
    [InlineData(0.05, 1e-5)]
    public void SelfTermMatchesClosedForm(double length, double radius)
    {
        var wire = new Wire([new Vector3(0, 0, 0), new Vector3(0, 0, 3 * length)], radius, PerfectConductor.Instance, null, WireEnds.Open);
        var model = new WireModel(new[] { wire }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, length), 1) });
        var mesh = MeshedModel.Create(model, 1e6, new SegmentationOptions(20, 3));
        Assert.Equal(length, mesh.Segments[0].LengthM, 12);
        var table = mesh.Table;
        int self = Enumerable.Range(0, table.PairCount).First(e => table.P[e] == 0 && table.Q[e] == 0);
        table.Moments(self, 1e-9, out var i00, out _, out _, out _);
        double S(double b) => 2 * (length * Math.Asinh(length / b) - Math.Sqrt(length * length + b * b) + b);
        double exact = MathNet.Numerics.Integration.DoubleExponentialTransformation.Integrate(
            phi => S(2 * radius * Math.Sin(phi / 2)), 0, Math.PI, 1e-12) / Math.PI / (length * length);
        Assert.Equal(1.0, i00.Real / exact, 4);
    }

    // The segment radiation integral F₀(β) = ∫₀¹ e^{jβu} du, F₁(β) = ∫₀¹ u e^{jβu} du: closed form and
    // small-β series against a 64-point Gauss–Legendre sum (MathNet.Numerics), across the switch-over.
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.01)]
    [InlineData(0.049)]
    [InlineData(0.051)]
    [InlineData(-0.7)]
    [InlineData(3.0)]
    public void SegmentRadiationIntegralMatchesQuadrature(double beta)
    {
        var (f0, f1) = Radiators.Shape(beta);
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(0, 1, 64);
        Complex n0 = 0, n1 = 0;
        for (int i = 0; i < 64; i++)
        {
            var e = Complex.Exp(new Complex(0, beta * rule.Abscissas[i]));
            n0 += rule.Weights[i] * e;
            n1 += rule.Weights[i] * rule.Abscissas[i] * e;
        }
        Assert.True((f0 - n0).Magnitude < 1e-9);
        Assert.True((f1 - n1).Magnitude < 1e-9);
    }
}
