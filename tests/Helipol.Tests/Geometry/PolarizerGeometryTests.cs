using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Tests.Geometry;

public class PolarizerGeometryTests
{
    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void EachElementIsAHelixOfTheGivenWireLengthAndRise(string name)
    {
        var input = BuildInputs.ByName(name);
        var g = new PolarizerGeometry(input);
        foreach (var e in g.Elements)
        {
            // Arc length by summing many short chords (converges to the curve length as the
            // chords shrink; any calculus text) must equal the wire length.
            var length = 0.0;
            var prev = e.PointAt(0);
            for (var k = 1; k <= 20000; k++)
            {
                var p = e.PointAt(k / 20000.0);
                length += (p - prev).Length;
                prev = p;
            }
            Assert.Equal(input.ElementLengthMm, length, 4);
            Assert.Equal(input.ElementRiseMm, e.PointAt(1).Z - e.PointAt(0).Z, 9);
            Assert.Equal(input.CentreHeightMm, (e.PointAt(1).Z + e.PointAt(0).Z) / 2, 9);
            // Radius: former's outer radius plus half the wire (the wire lies on the former).
            var start = e.PointAt(0);
            Assert.Equal(input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2, Math.Sqrt(start.X * start.X + start.Y * start.Y), 9);
            // Element k starts at azimuth 360°·k/N.
            var expected = 2 * Math.PI * (e.Number - 1) / input.ElementCount;
            Assert.Equal(Math.Cos(expected), start.X / g.ElementAxisRadiusMm, 9);
            Assert.Equal(Math.Sin(expected), start.Y / g.ElementAxisRadiusMm, 9);
        }
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void WindingSetsWhichWayTheAzimuthTurnsAsTheElementRises(string name)
    {
        var input = BuildInputs.ByName(name);
        var e = new PolarizerGeometry(input).Elements[0];
        var a = e.PointAt(0.4);
        var b = e.PointAt(0.6);
        // z component of a × b > 0 means b lies counter-clockwise of a seen from above (+z).
        var turn = a.X * b.Y - a.Y * b.X;
        Assert.Equal(input.Winding == Winding.Right ? 1 : -1, Math.Sign(turn));
    }

    [Fact]
    public void PitchAngleIsTheUnrolledLineAngle()
    {
        // Pitch from horizontal of a helix unrolled onto a plane: atan(rise / horizontal run),
        // with horizontal run² + rise² = length² (Pythagoras on the developed cylinder).
        var input = BuildInputs.Typical;
        var g = new PolarizerGeometry(input);
        var run = Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm);
        Assert.Equal(Math.Atan(input.ElementRiseMm / run), g.PitchAngleRad, 12);
        Assert.Equal(run / g.ElementAxisRadiusMm, g.ArcAngleRad, 12);
    }

    [Fact]
    public void BendRadiusMatchesTheCurvatureMeasuredOnTheCurve()
    {
        // Curvature measured from three nearby points as the radius of their circumscribed circle
        // (R = abc / 4·area, Heron), independent of the closed form used by the geometry.
        var e = new PolarizerGeometry(BuildInputs.Typical).Elements[0];
        Point3 p = e.PointAt(0.499), q = e.PointAt(0.5), r = e.PointAt(0.501);
        double a = (q - p).Length, b = (r - q).Length, c = (r - p).Length;
        var area = Point3.Cross(q - p, r - p).Length / 2;
        var measured = a * b * c / (4 * area);
        Assert.Equal(new PolarizerGeometry(BuildInputs.Typical).BendRadiusMm, measured, 3);
    }

    [Fact]
    public void AnElementThatWouldLeaveTheFormerIsRefused()
    {
        var bad = BuildInputs.Typical with { CentreHeightMm = 1 };
        var ex = Assert.Throws<ArgumentException>(() => new PolarizerGeometry(bad));
        Assert.Contains("centre height", ex.Message);
    }
}
