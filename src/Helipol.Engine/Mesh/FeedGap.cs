namespace Helipol.Engine.Mesh;

/// <summary>
/// The finite-gap feed: a source's voltage V is the line integral of a uniform field V/g over a gap of
/// width g centred on its node, along the wire's reference direction (the "finite gap" source of the
/// antenna-feed literature, e.g. Balanis, *Antenna Theory*, §8.4, against the delta gap of zero width).
/// Galerkin testing gives each basis m the voltage V_m = ∫ f_m·E dl over the gap; reciprocity then makes
/// the input current the same weighted sum of basis currents, I_in = Σ (V_m/V) I_m, so that
/// Z_in = V/I_in and ½ Re(V I_in*) is the power the source delivers. A delta gap at a node (g → 0)
/// drives the node's basis alone; its feed capacitance grows without bound as segments shorten, which
/// is why a thick wire's input reactance depended on the segmentation. With a wire end on a perfect
/// ground the image supplies the other half of the gap, so the field over the half on the wire is V/(g/2).
/// The gap stays inside the two segments at the node: g is at most the shorter of them.
/// </summary>
internal static class FeedGap
{
    /// <summary>Default gap width in wire radii.</summary>
    public const double DefaultGapInRadii = 0.5;

    /// <summary>
    /// The gap a source gets when its model names none: half the radius of the thickest wire at the node.
    /// It is the width at which a thick dipole's input reactance stops depending on the segmentation
    /// (24.3 mm × 1.0 mm at 5.8 GHz: +14.6, +14.9, +14.7 Ω at 16, 30 and 58 segments, where the delta gap
    /// gives +13.5, +12.8, +10.7 Ω), and it gives the reactance of NEC-2's extended kernel and of FDTD
    /// (+11.5 … +14.7 and +12.5 Ω; Nec2Comparison/FeedGapTests) — a choice of this engine, not a
    /// published figure.
    /// </summary>
    public static double DefaultGapM(int nodeBasis, BasisPiece[] pieces, Segment[] segs)
    {
        double a = 0;
        foreach (var p in pieces) if (p.Basis == nodeBasis) a = Math.Max(a, segs[p.Segment].RadiusM);
        return DefaultGapInRadii * a;
    }

    /// <summary>Bases driven by a source at the node of <paramref name="nodeBasis"/>, with their V_m/V.</summary>
    public static (int[] Bases, double[] Weights) Spread(int nodeBasis, BasisPiece[] pieces, Segment[] segs, double gapM)
    {
        var own = pieces.Where(p => p.Basis == nodeBasis).ToArray();
        if (gapM <= 0) return ([nodeBasis], [1.0]);
        double g = gapM;
        foreach (var np in own) g = Math.Min(g, segs[np.Segment].LengthM);
        double field = 1.0 / (g * own.Length / 2);
        var weights = new SortedDictionary<int, double>();
        foreach (var np in own)
        {
            var s = segs[np.Segment];
            double delta = g / (2 * s.LengthM);
            bool nodeAtStart = !np.Rising;
            foreach (var b in pieces)
            {
                if (b.Segment != np.Segment) continue;
                double near = delta - delta * delta / 2, far = delta * delta / 2;
                // ∫ shape du over the gap's part of the segment: the shape that is 1 at the node gets `near`.
                double integral = (b.Rising != nodeAtStart) ? near : far;
                double w = field * b.Sign * np.Sign * s.LengthM * integral;
                weights[b.Basis] = weights.GetValueOrDefault(b.Basis) + w;
            }
        }
        return (weights.Keys.ToArray(), weights.Values.ToArray());
    }
}
