using Helipol.Geometry;

namespace Helipol.Tests.Geometry;

/// <summary>
/// Ring face marks and drilling guides against the stack worked out here from the input alone:
/// every element's wire runs from height C − h/2 to C + h/2 (centre height C, rise h) and ring i's
/// faces stand at H·(i−1)/n and H·i/n (former height H, n rings). A face is crossed only when it
/// lies strictly between the two ends; an end inside a ring is shown on the face beyond it.
/// </summary>
public class RingFaceMarkTests
{
    /// <summary>The reviewed case: a 20 mm former in four 5 mm rings, elements spanning
    /// 3.74–16.26 mm, so ring 1's bottom face and ring 4's top face are never reached.</summary>
    private static PolarizerBuildInput FourRingStack => BuildInputs.Typical with
    {
        FormerHeightMm = 20, RingCount = 4, CentreHeightMm = 10, ElementRiseMm = 12.52,
    };

    public static IEnumerable<object[]> Stacks() => [["FourRingStack"], ["Typical"], ["LeftSixOnLetter"], ["Large"]];

    private static PolarizerBuildInput Stack(string name) => name == "FourRingStack" ? FourRingStack : BuildInputs.ByName(name);

    [Theory]
    [MemberData(nameof(Stacks))]
    public void TicksOnlyWhereTheWireCrossesAndEndsWithTheirDepth(string name)
    {
        var input = Stack(name);
        var g = new PolarizerGeometry(input);
        var low = input.CentreHeightMm - input.ElementRiseMm / 2;
        var high = input.CentreHeightMm + input.ElementRiseMm / 2;
        for (var ring = 1; ring <= input.RingCount; ring++)
        {
            var zBottom = input.FormerHeightMm * (ring - 1) / input.RingCount;
            var zTop = input.FormerHeightMm * ring / input.RingCount;
            foreach (var face in new[] { RingFace.Top, RingFace.Bottom })
            {
                var z = face == RingFace.Top ? zTop : zBottom;
                var v = RingTemplates.View(g, ring, face, new Point2(0, 0), g.FormerOuterRadiusMm, g.FormerBoreRadiusMm);
                var crossings = v.Marks.Where(m => m.Kind == FaceMarkKind.Crossing).ToList();
                var ends = v.Marks.Where(m => m.Kind == FaceMarkKind.End).ToList();
                Assert.Equal(low < z && z < high ? input.ElementCount : 0, crossings.Count);
                // The lower end lies in the ring whose [bottom, top) holds it, the upper end in (bottom, top].
                var endHere = face == RingFace.Bottom ? zBottom <= low && low < zTop : zBottom < high && high <= zTop;
                Assert.Equal(endHere ? input.ElementCount : 0, ends.Count);
                var depth = face == RingFace.Bottom ? low - zBottom : zTop - high;
                Assert.All(ends, m => Assert.Equal(depth, m.DepthMm, 9));
            }
        }
    }

    [Fact]
    public void FourRingStackMarksNeitherOuterFace()
    {
        var g = new PolarizerGeometry(FourRingStack);
        var ring1Bottom = RingTemplates.View(g, 1, RingFace.Bottom, new Point2(0, 0), g.FormerOuterRadiusMm, g.FormerBoreRadiusMm);
        var ring4Top = RingTemplates.View(g, 4, RingFace.Top, new Point2(0, 0), g.FormerOuterRadiusMm, g.FormerBoreRadiusMm);
        Assert.DoesNotContain(ring1Bottom.Marks, m => m.Kind == FaceMarkKind.Crossing);
        Assert.DoesNotContain(ring4Top.Marks, m => m.Kind == FaceMarkKind.Crossing);
        // 10 − 12.52/2 = 3.74 mm above ring 1's bottom face; 20 − 16.26 = 3.74 mm below ring 4's top.
        Assert.All(ring1Bottom.Marks, m => Assert.Equal(3.74, m.DepthMm, 9));
        Assert.All(ring4Top.Marks, m => Assert.Equal(3.74, m.DepthMm, 9));
        Assert.Equal("o element end 3.74 mm into the ring", RingTemplates.EndNote(ring1Bottom));
    }

    [Fact]
    public void BlindHoleIsDrilledAtTheAngleOfTheWireInsideTheRing()
    {
        // Typical: ring 1 spans 0–11 mm, the wire 7.6–14.4 mm, so 3.4 mm of wire lies in ring 1
        // and enters only by its top face. Over that height the element turns half its arc angle
        // θ = sqrt(L² − h²)/R; a straight hole on the hole circle r joins the two points, so its
        // chord is 2·r·sin(θ/4) and its tilt from the axis atan(chord / 3.4 mm).
        var input = BuildInputs.Typical;
        var g = new PolarizerGeometry(input);
        var R = input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2;
        var theta = Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm) / R;
        var r = DrillTemplates.HoleCircleRadiusMm(g);
        var views = DrillTemplates.Views(g);
        var top = views.Single(v => v.RingNumber == 1 && v.Face == RingFace.Top);
        var bottom = views.Single(v => v.RingNumber == 1 && v.Face == RingFace.Bottom);
        Assert.Equal(input.ElementCount, top.Holes.Count);
        Assert.Empty(bottom.Holes);
        Assert.Equal(input.ElementCount, bottom.Ends.Count);
        Assert.All(bottom.Ends, e => Assert.Equal(7.6, e.DepthMm, 9));
        var expected = Math.Atan(2 * r * Math.Sin(theta / 4) / 3.4) * 180 / Math.PI;
        Assert.All(top.Holes, h =>
        {
            Assert.False(h.Through);
            Assert.Equal(3.4, h.DepthMm, 9);
            Assert.Equal(expected, h.AngleFromNormalDeg, 9);
        });
    }

    [Fact]
    public void ThroughHoleIsTheChordOverTheRingThickness()
    {
        // FourRingStack: ring 2 (5–10 mm) lies wholly within the wire (3.74–16.26 mm), so each hole
        // runs through; over 5 mm the element turns θ·5/12.52, chord 2·r·sin(that/2).
        var input = FourRingStack;
        var g = new PolarizerGeometry(input);
        var R = input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2;
        var theta = Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm) / R;
        var r = DrillTemplates.HoleCircleRadiusMm(g);
        var expected = Math.Atan(2 * r * Math.Sin(theta * 5 / 12.52 / 2) / 5) * 180 / Math.PI;
        foreach (var v in DrillTemplates.Views(g).Where(v => v.RingNumber == 2))
        {
            Assert.Equal(input.ElementCount, v.Holes.Count);
            Assert.Empty(v.Ends);
            Assert.All(v.Holes, h => { Assert.True(h.Through); Assert.Equal(5, h.DepthMm, 9); Assert.Equal(expected, h.AngleFromNormalDeg, 9); });
        }
    }

    [Fact]
    public void ElementInsideOneRingGetsNoHole()
    {
        // LeftSixOnLetter: one 18 mm ring, wire 5.25–12.75 mm: it reaches neither face, so no
        // straight hole from a face can carry it; both ends are shown 5.25 mm in from their faces.
        var g = new PolarizerGeometry(BuildInputs.LeftSixOnLetter);
        foreach (var v in DrillTemplates.Views(g))
        {
            Assert.Empty(v.Holes);
            Assert.Equal(Enumerable.Range(1, 6), v.Enclosed);
            Assert.All(v.Ends, e => Assert.Equal(5.25, e.DepthMm, 9));
        }
    }
}
