using Helipol.Design;
using Helipol.Design.Loading;

namespace Helipol.Tests.Design;

/// <summary>The sleeve handed to the engine carries the field solve's added inductance, no more and no less.</summary>
public class EffectiveCoatingTests
{
    // The engine's coated-wire term is (μ0/2π)(1 − 1/εr) ln(b/a) (Richmond and Newman, Radio Science
    // 11(1), 1976); the equivalent sleeve must reproduce the cross-section's S through that formula.
    [Theory]
    [InlineData(1.0)]
    [InlineData(2.5)]
    public void TheEquivalentSleeveHasTheSolvedInductance(double factor)
    {
        var s = new Surroundings(Loading.CrossSectionSolveTests.TapeHug, factor);
        var coat = s.CoatingFor(0.25e-3)!;
        double sleeve = (1 - 1 / coat.RelativePermittivity) * Math.Log(coat.OuterRadiusM / 0.25e-3);
        Assert.Equal(AddedInductance.ShapeFactor(s.Section), sleeve, 9);
        Assert.Equal(factor, coat.InductanceScale);
        Assert.Equal(factor * AddedInductance.HPerM(s.Section), s.AddedInductanceHPerM, 15);
    }

    // The tolerance analysis's scaled wrap: at a multiple of 10 % it is the solved section itself,
    // between multiples within 1 % of solving the scaled section directly (S grows smoothly with thickness).
    [Fact]
    public void AScaledWrapIsInterpolatedCloseToItsOwnSolve()
    {
        var s = new Surroundings(Loading.CrossSectionSolveTests.TapeHug, 1);
        var direct = AddedInductance.ShapeFactor(s.Section with { WrapThicknessM = s.Section.WrapThicknessM * 1.15 });
        Assert.InRange(s.WithWrapScaled(1.15).ShapeFactor / direct, 0.99, 1.01);
        Assert.Equal(AddedInductance.ShapeFactor(s.Section with { WrapThicknessM = s.Section.WrapThicknessM * 0.8 }), s.WithWrapScaled(0.8).ShapeFactor, 9);
    }

    [Fact]
    public void AirAroundTheWireIsNoCoating()
    {
        Assert.Null(Surroundings.None(0.4e-3).CoatingFor(0.4e-3));
    }
}
