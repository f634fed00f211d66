namespace Helipol.Design.Loading;

/// <summary>
/// S of a cross-section whose wrap is scaled in thickness (the Monte Carlo's wrap spread), from a
/// few solved sections instead of one solve per scale.
///
/// <para>Why this works: the wrap adds loading roughly as the logarithm of its outer radius over
/// the wire's (the concentric case is exactly (1 − 1/εr) ln(1 + t/a), Richmond and Newman, Radio
/// Science 11(1), 1976), so S is smooth and nearly linear in ln(scale). The sections are solved at
/// scales q^k (q = <see cref="NodeRatio"/>, k an integer), and a scale between q^(2m−1) and
/// q^(2m+1) is read off the quadratic in ln(scale) through the three nodes k = 2m − 1, 2m, 2m + 1.
/// The pieces share their end nodes, so the result is continuous in the scale, and the nominal
/// section (k = 0) is always a node, so scale 1 is the nominal solve itself. A ±30 % spread
/// (scales 0.7-1.3) then needs two solves beside the nominal one. The test against direct solves
/// holds the interpolation within 0.5 %.</para>
///
/// Scales below q^−<see cref="MaxNodePower"/> (a wrap nearly gone, where ln(scale) runs away) or above
/// q^<see cref="MaxNodePower"/> are solved directly (cached per rounded section).
/// The nominal thickness is the rounded one (<see cref="ElementCrossSection.Rounded"/>, at most 1 %
/// off), as for the nominal solve.
/// </summary>
public static class WrapScaleInterpolation
{
    /// <summary>Ratio of thickness between neighbouring solved sections.</summary>
    public const double NodeRatio = 1.5;

    /// <summary>Nodes run from q^−3 to q^3 (scales 0.30 to 3.4); odd, so the pieces (even middles) tile the range.</summary>
    public const int MaxNodePower = 3;

    /// <summary>S of <paramref name="section"/> with its wrap <paramref name="scale"/> times as thick.</summary>
    public static double ShapeFactor(ElementCrossSection section, double scale)
    {
        if (scale == 1 || section.WrapThicknessM <= 0) return AddedInductance.ShapeFactor(section);
        // Nodes scale the rounded section (the nominal solve's own input) and are solved unrounded,
        // so they sit exactly at q^k: rounding each node by up to 1 % in thickness would move S by
        // up to about 0.6 % on a tape wrap, more than the interpolation's own error.
        var nominal = section.Rounded();
        double Scaled(double s) => AddedInductance.ShapeFactorAsGiven(nominal with { WrapThicknessM = nominal.WrapThicknessM * s });
        double lnQ = Math.Log(NodeRatio);
        double x = scale > 0 ? Math.Log(scale) / lnQ : double.NegativeInfinity;
        if (!(Math.Abs(x) <= MaxNodePower)) return AddedInductance.ShapeFactor(section with { WrapThicknessM = section.WrapThicknessM * Math.Max(0, scale) });
        // The piece whose middle node is even: k = 2m − 1, 2m, 2m + 1 with |x − 2m| ≤ 1.
        int mid = Math.Clamp(2 * (int)Math.Round(x / 2, MidpointRounding.AwayFromZero), 1 - MaxNodePower, MaxNodePower - 1);
        double t = x - mid;
        double lo = Scaled(Math.Pow(NodeRatio, mid - 1)), m0 = mid == 0 ? AddedInductance.ShapeFactor(nominal) : Scaled(Math.Pow(NodeRatio, mid)), hi = Scaled(Math.Pow(NodeRatio, mid + 1));
        // Lagrange quadratic through t = −1, 0, 1.
        return m0 + t * (hi - lo) / 2 + t * t * (hi - 2 * m0 + lo) / 2;
    }
}
