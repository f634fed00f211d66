namespace Helipol.Engine.Mesh;

/// <summary>
/// End-cap model for free wire ends. A flat end of a wire of radius a carries charge on its cap, of
/// area πa², which the thin-wire model (current and charge on the tube's side only, current zero at
/// the end) leaves out; the tip then looks electrically short and resonances come high. The cap's
/// area equals the side area 2πa·(a/2) of a further a/2 of tube, so each free end is lengthened by
/// a/2 along its last edge and the current is set to zero there: the charge the cap would hold sits
/// on the extension instead. This is the equal-area end correction in common use with thin-wire codes
/// (from memory); its accuracy for moderately thick wires is discussed by Heldring, Úbeda and Rius,
/// "Accurate and efficient end cap model for cylindrical wire antenna analysis", Electronics Letters
/// 41(19), 2005. Checked here against NEC-2's extended kernel, whose end condition carries the cap's
/// charge (Nec2Comparison/LoneElementTests).
/// An end is free when no vertex of any wire (its own included) and no perfect ground touches it.
/// </summary>
internal static class EndCaps
{
    public static Wire Extended(IReadOnlyList<Wire> wires, int w, bool ground, double tol)
    {
        var wire = wires[w];
        if (wire.Ends == WireEnds.Open) return wire;
        var pts = wire.PointsM;
        bool first = IsFree(wires, w, 0, ground, tol), last = IsFree(wires, w, pts.Count - 1, ground, tol);
        if (!first && !last) return wire;
        var moved = pts.ToArray();
        double ext = 0.5 * wire.RadiusM;
        if (first) moved[0] = Beyond(pts[0], pts[1], ext);
        if (last) moved[^1] = Beyond(pts[^1], pts[^2], ext);
        return wire with { PointsM = moved };
    }

    /// <summary>The point <paramref name="extensionM"/> beyond <paramref name="end"/>, away from <paramref name="inner"/>.</summary>
    private static Vector3 Beyond(Vector3 end, Vector3 inner, double extensionM)
    {
        var d = end - inner;
        return end + (extensionM / d.Length) * d;
    }

    private static bool IsFree(IReadOnlyList<Wire> wires, int w, int index, bool ground, double tol)
    {
        var p = wires[w].PointsM[index];
        if (ground && Math.Abs(p.Z) <= tol) return false;
        for (int v = 0; v < wires.Count; v++)
        {
            var pts = wires[v].PointsM;
            for (int i = 0; i < pts.Count; i++)
                if (!(v == w && i == index) && Vector3.Distance(pts[i], p) <= tol) return false;
        }
        return true;
    }
}
