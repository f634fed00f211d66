namespace Helipol.Geometry;

/// <summary>A closed triangle mesh in millimetres; each triangle lists vertex indices
/// counter-clockwise seen from outside (right-hand rule gives the outward normal).</summary>
public sealed record TriangleMesh(IReadOnlyList<Point3> Vertices, IReadOnlyList<(int A, int B, int C)> Triangles)
{
    /// <summary>Enclosed volume by the divergence theorem: the sum of signed tetrahedra from the origin.</summary>
    public double VolumeMm3()
    {
        var v = 0.0;
        foreach (var (a, b, c) in Triangles)
            v += Point3.Dot(Vertices[a], Point3.Cross(Vertices[b], Vertices[c])) / 6.0;
        return v;
    }
}
