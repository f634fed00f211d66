using CsCheck;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Tests.Geometry;

/// <summary>
/// Closed 2-manifold check of our own, beside admesh: in a closed, consistently oriented surface
/// every directed edge appears exactly once and its reverse exactly once (the half-edge condition
/// of polyhedral surfaces, any computational geometry text); with counter-clockwise-from-outside
/// faces the divergence-theorem volume is then positive.
/// </summary>
public class MeshTopologyTests
{
    internal static void AssertClosedManifold(TriangleMesh mesh)
    {
        var directed = new Dictionary<(int, int), int>();
        foreach (var (a, b, c) in mesh.Triangles)
        {
            Assert.True(a != b && b != c && a != c, "triangle repeats a vertex");
            foreach (var e in new[] { (a, b), (b, c), (c, a) })
                directed[e] = directed.GetValueOrDefault(e) + 1;
        }
        foreach (var (edge, count) in directed)
        {
            Assert.True(count == 1, $"edge {edge} used {count} times in one direction");
            Assert.True(directed.GetValueOrDefault((edge.Item2, edge.Item1)) == 1, $"edge {edge} has no opposite");
        }
        foreach (var (a, b, c) in mesh.Triangles)
        {
            var area = Point3.Cross(mesh.Vertices[b] - mesh.Vertices[a], mesh.Vertices[c] - mesh.Vertices[a]).Length / 2;
            Assert.True(area > 1e-9, "degenerate triangle");
        }
        Assert.True(mesh.VolumeMm3() > 0, "faces point inward");
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void FormerAndJigAreClosedManifolds(string name)
    {
        var g = new PolarizerGeometry(BuildInputs.ByName(name));
        AssertClosedManifold(FormerMesh.Build(FormerSleeve.From(g), g.Input.ElementCount));
        AssertClosedManifold(BendingJig.From(g).Mesh());
    }

    [Fact]
    public void FormerStaysClosedOverARangeOfBuilds()
    {
        // Random buildable inputs: counts, winding, pitch and placement, including grooves that
        // run out through an end face.
        var gen = Gen.Select(Gen.Int[3, 8], Gen.Bool, Gen.Double[0.35, 0.75], Gen.Double[0.0, 1.0], Gen.Double[0.5, 1.2]);
        gen.Sample((n, right, riseFraction, place, wire) =>
        {
            var length = 12.0;
            var rise = riseFraction * length;
            var height = rise + 6;
            var input = BuildInputs.Typical with
            {
                ElementCount = n, Winding = right ? Winding.Right : Winding.Left, ElementLengthMm = length,
                ElementRiseMm = rise, FormerHeightMm = height, CentreHeightMm = rise / 2 + place * (height - rise), WireDiameterMm = wire,
                FormerOuterDiameterMm = 18,
            };
            var g = new PolarizerGeometry(input);
            AssertClosedManifold(FormerMesh.Build(FormerSleeve.From(g), n));
        }, iter: 12);
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void FormerChordErrorIsWithinTwoHundredthsOfAMillimetre(string name)
    {
        // A flat triangle whose corners lie on a cylinder of radius r and span an azimuth Δ sits at
        // most r(1 − cos(Δ/2)) inside it (sagitta of the widest chord).
        var g = new PolarizerGeometry(BuildInputs.ByName(name));
        var mesh = FormerMesh.Build(FormerSleeve.From(g), g.Input.ElementCount);
        var worst = 0.0;
        foreach (var (a, b, c) in mesh.Triangles)
        {
            var pts = new[] { mesh.Vertices[a], mesh.Vertices[b], mesh.Vertices[c] };
            var radii = pts.Select(p => Math.Sqrt(p.X * p.X + p.Y * p.Y)).ToArray();
            if (radii.Max() - radii.Min() > 1e-6) continue;
            var angles = pts.Select(p => Math.Atan2(p.Y, p.X)).ToArray();
            var span = 0.0;
            for (var i = 0; i < 3; i++)
                for (var j = 0; j < 3; j++)
                {
                    var d = Math.Abs(angles[i] - angles[j]);
                    span = Math.Max(span, Math.Min(d, 2 * Math.PI - d));
                }
            worst = Math.Max(worst, radii[0] * (1 - Math.Cos(span / 2)));
        }
        Assert.InRange(worst, 0, 0.02);
    }
}
