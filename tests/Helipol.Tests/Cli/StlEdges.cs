namespace Helipol.Tests.Cli;

/// <summary>
/// Our own watertightness check of a binary STL file (layout per the STL format as published
/// with 3D Systems' StereoLithography Interface Specification: 80-byte header, uint32 count,
/// 50 bytes per facet). A closed, consistently oriented two-manifold uses every directed edge
/// exactly once and its reverse exactly once.
/// </summary>
internal static class StlEdges
{
    public static void AssertClosedTwoManifold(byte[] stl, string what)
    {
        Assert.True(stl.Length >= 84, $"{what}: shorter than an STL header");
        var count = BitConverter.ToUInt32(stl, 80);
        Assert.True(stl.Length == 84 + 50L * count, $"{what}: {stl.Length} bytes for {count} facets");
        var edges = new Dictionary<(Vertex, Vertex), int>();
        for (int f = 0; f < count; f++)
        {
            int at = 84 + 50 * f + 12;
            var v = new Vertex[3];
            for (int k = 0; k < 3; k++)
                v[k] = new Vertex(BitConverter.ToSingle(stl, at + 12 * k), BitConverter.ToSingle(stl, at + 12 * k + 4), BitConverter.ToSingle(stl, at + 12 * k + 8));
            Assert.True(v[0] != v[1] && v[1] != v[2] && v[2] != v[0], $"{what}: degenerate facet {f}");
            for (int k = 0; k < 3; k++)
            {
                var e = (v[k], v[(k + 1) % 3]);
                edges[e] = edges.GetValueOrDefault(e) + 1;
            }
        }
        foreach (var ((a, b), n) in edges)
        {
            Assert.True(n == 1, $"{what}: directed edge {a}→{b} used {n} times");
            Assert.True(edges.ContainsKey((b, a)), $"{what}: open edge {a}→{b}");
        }
    }

    private readonly record struct Vertex(float X, float Y, float Z);
}
