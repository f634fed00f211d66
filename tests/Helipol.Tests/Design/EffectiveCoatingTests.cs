using Helipol.Design;
using Helipol.Design.Loading;

namespace Helipol.Tests.Design;

/// <summary>The sleeve handed to the engine carries the field solve's added inductance, no more and no less.</summary>
public class EffectiveCoatingTests(Xunit.Abstractions.ITestOutputHelper output)
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

    // The tolerance analysis's scaled wrap: at scale 1 it is the nominal solve itself, and across
    // the default ±30 % spread and beyond it stays within 0.5 % of solving the scaled section
    // directly (S grows smoothly, about as ln of the wrap's outer radius: Richmond and Newman,
    // Radio Science 11(1), 1976). Tape hugging the wire, and tape tenting over glue.
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void AScaledWrapIsInterpolatedWithinHalfAPercentOfItsOwnSolve(bool tentOverGlue)
    {
        var section = Loading.CrossSectionSolveTests.TapeHug;
        if (tentOverGlue) section = section with { GluePermittivity = 2.5, GlueThicknessM = 0.2e-3, TentDistanceM = 0.8e-3 };
        section = section.Rounded();   // the nominal thickness the interpolation scales (at most 1 % off the given one)
        var s = new Surroundings(section, 1);
        Assert.Equal(AddedInductance.ShapeFactor(section), s.WithWrapScaled(1).ShapeFactor, 12);
        foreach (double scale in new[] { 0.5, 0.7, 0.85, 1.15, 1.3, 1.9 })
        {
            double direct = AddedInductance.Solve(section with { WrapThicknessM = section.WrapThicknessM * scale }, AddedInductance.DefaultAngularCells);
            double interpolated = s.WithWrapScaled(scale).ShapeFactor;
            output.WriteLine($"scale {scale}: interpolated {interpolated:0.00000}, direct {direct:0.00000}, {100 * (interpolated / direct - 1):+0.000;-0.000} %");
            Assert.InRange(interpolated / direct, 0.995, 1.005);
        }
    }

    [Fact]
    public void AirAroundTheWireIsNoCoating()
    {
        Assert.Null(Surroundings.None(0.4e-3).CoatingFor(0.4e-3));
    }
}
