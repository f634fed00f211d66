using Complex = System.Numerics.Complex;
using Helipol.Engine;
using Helipol.Engine.Kernel;

namespace Helipol.Tests.Engine;

public class QuadratureTests
{
    // Closed form of the reduced-kernel static self term (elementary; Gradshteyn and Ryzhik 2.271):
    // ∫₀ᴸ∫₀ᴸ dz dz' / sqrt((z − z')² + a²) = 2[L asinh(L/a) − sqrt(L² + a²) + a].
    // The engine integrates the inner part in closed form and the outer part numerically with
    // end-clustered nodes; at k → 0 the smooth remainder vanishes and I00 must match to 1e-4.
    [Theory]
    [InlineData(0.05, 0.0125)]
    [InlineData(0.05, 1e-3)]
    [InlineData(0.05, 1e-5)]
    public void SelfTermMatchesClosedForm(double length, double radius)
    {
        var wire = Wire.Straight(new Vector3(0, 0, 0), new Vector3(0, 0, 3 * length), radius);
        var model = new WireModel(new[] { wire }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, length), 1) });
        var mesh = MeshedModel.Create(model, 1e6, new SegmentationOptions(20, 3));
        var table = mesh.Table;
        int self = Enumerable.Range(0, table.PairCount).First(e => table.P[e] == 0 && table.Q[e] == 0);
        table.Moments(self, 1e-9, out var i00, out _, out _, out _);
        double exact = 2 * (length * Math.Asinh(length / radius) - Math.Sqrt(length * length + radius * radius) + radius) / (length * length);
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
