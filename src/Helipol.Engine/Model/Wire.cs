namespace Helipol.Engine;

/// <summary>
/// A thin wire laid along a polyline. Points are in metres; every vertex becomes a segment node, so
/// bends are respected. Polylines that share an end point or vertex are joined there (a junction);
/// an end that touches nothing is a free end. A <see cref="WireEnds.Flat"/> free end carries charge on
/// its cap: the mesh lengthens it by half the radius for that charge (Mesh/EndCaps.cs) and the current
/// falls to zero there. <see cref="WireEnds.Open"/> leaves the cap out (a thin-walled open tube, the
/// model of the classical dipole tables).
/// </summary>
public sealed record Wire(IReadOnlyList<Vector3> PointsM, double RadiusM, Conductor Conductor, DielectricCoating? Coating = null,
    WireEnds Ends = WireEnds.Flat)
{
    /// <summary>A straight lossless wire between two points.</summary>
    public static Wire Straight(Vector3 fromM, Vector3 toM, double radiusM, Conductor? conductor = null) =>
        new(new[] { fromM, toM }, radiusM, conductor ?? PerfectConductor.Instance);
}

/// <summary>What a free wire end is: a flat cut (charge on the cap) or an open tube (no cap).</summary>
public enum WireEnds
{
    Flat,
    Open,
}
