using Helipol.Geometry;
using Helipol.Model;
using Helipol.Tests.Geometry;

namespace Helipol.Tests.Model;

/// <summary>
/// `check` must refuse exactly the boards the ring templates cannot nest one ring on; otherwise a
/// design passes `check` and `build` refuses it later with no line and column. The reference is the
/// layout rule of Geometry/RingTemplates.cs, which draws the rings.
/// </summary>
public class BoardCheckTests
{
    [Theory]
    [InlineData(28.0, 0.2)]
    [InlineData(150.0, 0.0)]
    [InlineData(1000.0, 0.5)]
    public void TheSmallestBoardTheCheckAcceptsIsTheSmallestTheTemplatesNest(double outerMm, double kerfMm)
    {
        var (widthMm, heightMm) = DesignChecks.BoardNeededMm(outerMm, kerfMm);
        PolarizerBuildInput Board(double w, double h) => BuildInputs.Typical with
        {
            FormerOuterDiameterMm = outerMm, FormerBoreDiameterMm = 6, KerfMm = kerfMm, BoardWidthMm = w, BoardHeightMm = h,
        };
        Assert.NotEmpty(RingTemplates.NestedTopFaces(new PolarizerGeometry(Board(widthMm + 1e-9, heightMm + 1e-9))));
        Assert.Throws<ArgumentException>(() => RingTemplates.NestedTopFaces(new PolarizerGeometry(Board(widthMm - 0.01, heightMm))));
        Assert.Throws<ArgumentException>(() => RingTemplates.NestedTopFaces(new PolarizerGeometry(Board(widthMm, heightMm - 0.01))));
    }
}
