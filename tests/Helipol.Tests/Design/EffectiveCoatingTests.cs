using Helipol.Design;
using Helipol.Engine;

namespace Helipol.Tests.Design;

/// <summary>The effective-coating model reduces to the published coated-wire inductance where it should.</summary>
public class EffectiveCoatingTests
{
    // A full concentric sleeve (covered share 1, nothing else): L' = (μ0/2π)(1 − 1/εr) ln(b/a)
    // (Richmond and Newman, Radio Science 11(1), 1976).
    [Theory]
    [InlineData(0.4e-3, 0.15e-3, 3.2)]
    [InlineData(0.5e-3, 1.0e-3, 2.5)]
    public void FullSleeveIsRichmondNewman(double a, double t, double eps)
    {
        var s = new Surroundings(FormerPermittivity: 1, GluePermittivity: 1, GlueThicknessM: 0, WrapPermittivity: eps, WrapThicknessM: t, CoveredFraction: 1, CalibrationFactor: 1);
        double expected = PhysicalConstants.Mu0 / (2 * Math.PI) * (1 - 1 / eps) * Math.Log((a + t) / a);
        Assert.Equal(expected, EffectiveCoating.InductanceHPerM(s, a), 15);
        var coat = EffectiveCoating.For(s, a)!;
        // The engine sleeve carries the same inductance: (1 − 1/εr') ln(b'/a) = the layered sum.
        Assert.Equal(EffectiveCoating.LayerSum(s, a), (1 - 1 / coat.RelativePermittivity) * Math.Log(coat.OuterRadiusM / a), 12);
    }

    // Concentric layers add (the same derivation applied shell by shell).
    [Fact]
    public void ConcentricLayersAdd()
    {
        double a = 0.4e-3;
        var s = new Surroundings(1, 2.5, 0.2e-3, 3.2, 0.15e-3, 1, 1);
        double expected = (1 - 1 / 2.5) * Math.Log(0.6 / 0.4) + (1 - 1 / 3.2) * Math.Log(0.75 / 0.6) + 0; // air beyond 0.8 mm
        Assert.Equal(expected, EffectiveCoating.LayerSum(s, a), 12);
    }

    [Fact]
    public void AirAroundTheWireIsNoCoatingAndTheFactorScalesTheInductance()
    {
        Assert.Null(Surroundings.None.CoatingFor(0.4e-3));
        var s = new Surroundings(1.03, 1, 0, 3.2, 0.15e-3, 0.5, 1);
        Assert.Equal(2 * EffectiveCoating.InductanceHPerM(s, 0.4e-3), EffectiveCoating.InductanceHPerM(s with { CalibrationFactor = 2 }, 0.4e-3), 15);
        // Half coverage loads less than full coverage of the same tape.
        Assert.True(EffectiveCoating.LayerSum(s, 0.4e-3) < EffectiveCoating.LayerSum(s with { CoveredFraction = 1 }, 0.4e-3));
    }
}
