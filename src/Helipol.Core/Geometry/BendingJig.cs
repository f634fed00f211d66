namespace Helipol.Geometry;

/// <summary>
/// A bending jig: a curved block with a channel along an arc at the element's bend radius, closed
/// by an end stop one element length along the channel's centre line. A straight wire pressed into
/// the channel from the open end takes the helix's curvature; cut it flush with the open end and
/// every element comes out the same length. Dimensions in mm; the block is swept round the z axis.
/// </summary>
public sealed record BendingJig(
    double BendRadiusMm, double ChannelWidthMm, double ChannelDepthMm, double InnerMarginMm, double OuterMarginMm,
    double ThicknessMm, double StopAngleRad, double EndAngleRad)
{
    public const double MarginMm = 5.0;
    public const double BaseMm = 3.0;
    public const double StopLengthMm = 5.0;
    public const double ChordToleranceMm = 0.01;

    public static BendingJig From(PolarizerGeometry g)
    {
        var d = g.Input.WireDiameterMm;
        var rho = g.BendRadiusMm;
        var stop = g.Input.ElementLengthMm / rho;
        var end = stop + StopLengthMm / rho;
        var inner = Math.Min(MarginMm, 0.5 * rho);
        if (end > 2 * Math.PI - 0.3)
            throw new ArgumentException($"element length: found {g.Input.ElementLengthMm} mm, allowed less than about one turn at the bend radius {rho:F1} mm for a jig");
        return new BendingJig(rho, d + g.Input.PrintClearanceMm, d, inner, MarginMm, d + BaseMm, stop, end);
    }

    /// <summary>The cross-section in (r, z), counter-clockwise: 0-1 bottom, 1-2 outer side, 2-3 top,
    /// 3-4-5-6 the channel (wall, floor, wall), 6-7 top, 7-0 inner side.</summary>
    public IReadOnlyList<(double R, double Z)> ChannelSection()
    {
        var r = BendRadiusMm;
        var w = ChannelWidthMm / 2;
        var t = ThicknessMm;
        return [(r - InnerMarginMm, 0), (r + OuterMarginMm, 0), (r + OuterMarginMm, t), (r + w, t),
                (r + w, t - ChannelDepthMm), (r - w, t - ChannelDepthMm), (r - w, t), (r - InnerMarginMm, t)];
    }

    public TriangleMesh Mesh()
    {
        var p = ChannelSection();
        var maxStep = 2 * Math.Acos(1 - ChordToleranceMm / (BendRadiusMm + OuterMarginMm));
        var n1 = Math.Max(2, (int)Math.Ceiling(StopAngleRad / maxStep));
        var n2 = Math.Max(1, (int)Math.Ceiling((EndAngleRad - StopAngleRad) / maxStep));
        var angles = Enumerable.Range(0, n1 + 1).Select(k => StopAngleRad * k / n1)
            .Concat(Enumerable.Range(1, n2).Select(k => StopAngleRad + (EndAngleRad - StopAngleRad) * k / n2)).ToList();
        var v = new List<Point3>();
        var tris = new List<(int, int, int)>();
        // Every station carries all 8 section points; past the stop the channel floor points (4, 5)
        // are simply not used, so those vertices are added only where they belong.
        var index = new int[angles.Count, 8];
        for (var k = 0; k < angles.Count; k++)
            for (var q = 0; q < 8; q++)
            {
                if (k > n1 && (q == 4 || q == 5)) { index[k, q] = -1; continue; }
                index[k, q] = v.Count;
                v.Add(Point3.Cylindrical(p[q].R, angles[k], p[q].Z));
            }
        int[] channelLoop = [0, 1, 2, 3, 4, 5, 6, 7];
        int[] solidLoop = [0, 1, 2, 3, 6, 7];
        for (var k = 0; k < angles.Count - 1; k++)
        {
            var loop = k < n1 ? channelLoop : solidLoop;
            for (var e = 0; e < loop.Length; e++)
            {
                int qa = loop[e], qb = loop[(e + 1) % loop.Length];
                int a0 = index[k, qa], b0 = index[k, qb], a1 = index[k + 1, qa], b1 = index[k + 1, qb];
                // Outward normal of a swept edge a→b of a counter-clockwise section is φ̂ × (b − a).
                tris.Add((a0, b1, b0));
                tris.Add((a0, a1, b1));
            }
        }
        // Open end (φ = 0), facing −φ̂: the section's counter-clockwise triangles.
        int I(int k, int q) => index[k, q];
        foreach (var (a, b, c) in new[] { (1, 2, 3), (1, 3, 4), (0, 1, 4), (0, 4, 5), (0, 5, 6), (0, 6, 7) })
            tris.Add((I(0, a), I(0, b), I(0, c)));
        // End stop wall across the channel at the stop angle, facing back along the channel (−φ̂).
        tris.Add((I(n1, 6), I(n1, 5), I(n1, 4)));
        tris.Add((I(n1, 6), I(n1, 4), I(n1, 3)));
        // Far end, facing +φ̂: the solid section reversed.
        var last = angles.Count - 1;
        foreach (var (a, b, c) in new[] { (0, 1, 2), (0, 2, 3), (0, 3, 6), (0, 6, 7) })
            tris.Add((I(last, a), I(last, c), I(last, b)));
        return new TriangleMesh(v, tris);
    }
}
