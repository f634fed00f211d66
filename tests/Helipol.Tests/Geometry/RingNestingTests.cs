using Helipol.Geometry;

namespace Helipol.Tests.Geometry;

public class RingNestingTests
{
    [Fact]
    public void ManyRingsSpillOntoFurtherBoardsWithoutOverlapping()
    {
        // Nine rings on a board that holds four: every cut contour must lie inside one board's
        // margin and no two contours may come closer than the part spacing (circle-circle
        // distance = centre distance − both radii).
        var input = BuildInputs.Typical with { RingCount = 9, FormerHeightMm = 27, CentreHeightMm = 13.5, BoardWidthMm = 70, BoardHeightMm = 80 };
        var g = new PolarizerGeometry(input);
        var parts = RingTemplates.NestedTopFaces(g);
        var boards = RingTemplates.BoardOrigins(g);
        Assert.Equal(9, parts.Count);
        Assert.True(boards.Count >= 3);
        foreach (var p in parts)
        {
            var r = p.CutOuterRadiusMm;
            Assert.Contains(boards, b =>
                p.Centre.X - r >= b.X + RingTemplates.BoardMarginMm - 1e-9 && p.Centre.X + r <= b.X + input.BoardWidthMm - RingTemplates.BoardMarginMm + 1e-9 &&
                p.Centre.Y - r >= b.Y + RingTemplates.BoardMarginMm - 1e-9 && p.Centre.Y + r <= b.Y + input.BoardHeightMm - RingTemplates.BoardMarginMm + 1e-9);
        }
        var spacing = RingTemplates.PartSpacingMm(input);
        for (var a = 0; a < parts.Count; a++)
            for (var b = a + 1; b < parts.Count; b++)
                Assert.True((parts[a].Centre - parts[b].Centre).Length - 2 * parts[a].CutOuterRadiusMm >= spacing - 1e-9);
    }

    [Fact]
    public void ABoardTooSmallForOneRingIsRefused()
    {
        var g = new PolarizerGeometry(BuildInputs.Typical with { BoardWidthMm = 15 });
        var ex = Assert.Throws<ArgumentException>(() => RingTemplates.NestedTopFaces(g));
        Assert.StartsWith("board:", ex.Message);
    }
}
