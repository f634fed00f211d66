namespace Helipol.Engine;

/// <summary>
/// A thin wire laid along a polyline. Points are in metres; every vertex becomes a segment node, so
/// bends are respected. Polylines that share an end point or vertex are joined there (a junction);
/// an end that touches nothing is a free end: the mesh lengthens it by half the radius for the charge
/// on its flat cap (Mesh/EndCaps.cs) and the current falls to zero there.
/// </summary>
public sealed record Wire(IReadOnlyList<Vector3> PointsM, double RadiusM, Conductor Conductor, DielectricCoating? Coating = null)
{
    /// <summary>A straight lossless wire between two points.</summary>
    public static Wire Straight(Vector3 fromM, Vector3 toM, double radiusM, Conductor? conductor = null) =>
        new(new[] { fromM, toM }, radiusM, conductor ?? PerfectConductor.Instance);
}
