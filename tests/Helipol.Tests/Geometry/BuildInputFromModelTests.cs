using Helipol.Geometry;
using Helipol.Geometry.FromModel;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Tests.Geometry;

public class BuildInputFromModelTests
{
    private static PolarizerDesign Demo(string file) =>
        DesignResolver.Resolve(SpecReader.ReadFile(Path.Combine(TestPaths.RepositoryRoot, "designs", file)));

    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B): the demo's 0.63 in element must arrive as 16.002 mm.
    [Fact]
    public void CarriesThePinnedDimensionsInMillimetres()
    {
        var design = Demo("ridge-video-rx.yaml");
        var layout = design.Practice;
        var input = BuildInputFromModel.Create(design, layout, Winding.Left);
        Assert.Equal(0.63 * 25.4, input.ElementLengthMm, 9);
        Assert.Equal(0.5 * 25.4, input.ElementRiseMm, 9);
        Assert.Equal(28.0, input.FormerOuterDiameterMm, 9);
        Assert.Equal(8.4, input.FormerBoreDiameterMm, 9);
        Assert.Equal(19.0 / 2, input.CentreHeightMm, 9);
        Assert.Equal(Sense.Rhcp, input.Sense);
        Assert.Equal(Winding.Left, input.Winding);
        Assert.Equal(5, input.ElementCount);
        Assert.Equal(1, input.RingCount);
        Assert.Equal(19.0, input.BoardThicknessMm, 9);
    }

    [Fact]
    public void RefusesAnUnresolvedWinding()
    {
        var design = Demo("ridge-video-rx.yaml");
        Assert.Throws<ArgumentException>(() => BuildInputFromModel.Create(design, design.Practice, Winding.Auto));
    }

    // The geometry convention of the design file: arc angle = sqrt(L² − h²)/R with R = OD/2 + d/2.
    // Both layers compute it independently; they must agree after the hand-over.
    [Fact]
    public void GeometryAgreesWithTheModelOnTheArcAngle()
    {
        var design = Demo("ridge-video-rx.yaml");
        var layout = design.Practice;
        var geometry = new PolarizerGeometry(BuildInputFromModel.Create(design, layout, Winding.Right));
        Assert.Equal(layout.ArcAngleRad, geometry.ArcAngleRad, 9);
        Assert.Equal(layout.AxisRadiusM * 1000, geometry.ElementAxisRadiusMm, 9);
    }
}
