namespace Helipol.Design;

/// <summary>
/// How precisely to cut: the ± length (and rise) spread that keeps the best-AR frequency inside the
/// band in 90 % of builds. First order in the slopes s_L, s_H of the best-AR frequency (MHz per mm,
/// central differences), with every element of a build off by the same amount (one ruler, one jig),
/// length and rise errors independent and uniform within ±k·t_L, ±k·t_H (the design's spreads scaled by
/// one factor k). The shift s_L·e_L + s_H·e_H must stay within the margin d from the nominal best-AR
/// frequency to the nearer band edge. Uniform errors give the shift a trapezoidal distribution
/// (the convolution of two uniform densities), whose 90 % point is found in closed form below.
/// </summary>
public static class CutTolerance
{
    public const double Share = 0.9;

    /// <returns>(± length mm, ± rise mm); (0, 0) when the best AR is outside the band; NaN when there is no slope.</returns>
    public static (double LengthMm, double RiseMm) For(double lowHz, double highHz, double bestArHz, double mhzPerMmLength, double mhzPerMmRise,
        double lengthSpreadMm, double riseSpreadMm)
    {
        if (!double.IsFinite(bestArHz) || !double.IsFinite(mhzPerMmLength)) return (double.NaN, double.NaN);
        if (bestArHz < lowHz || bestArHz > highHz) return (0, 0);
        double marginMHz = Math.Min(bestArHz - lowHz, highHz - bestArHz) / 1e6;
        double sH = double.IsFinite(mhzPerMmRise) ? mhzPerMmRise : 0;
        // Half-widths of the two uniform shift components at k = 1.
        double a = Math.Abs(mhzPerMmLength) * lengthSpreadMm, b = Math.Abs(sH) * riseSpreadMm;
        if (a + b <= 0) return (double.PositiveInfinity, double.PositiveInfinity);
        double q = Quantile(Math.Max(a, b), Math.Min(a, b), Share);
        double k = marginMHz / q;
        return (k * lengthSpreadMm, k * riseSpreadMm);
    }

    /// <summary>
    /// The value x with P(|X + Y| ≤ x) = p for X ~ U(−a, a), Y ~ U(−b, b), a ≥ b ≥ 0: the density of the
    /// sum is flat at 1/(2a) for |x| ≤ a − b and falls linearly to zero at a + b.
    /// </summary>
    public static double Quantile(double a, double b, double p)
    {
        if (b <= 1e-15 * a) return p * a;
        double flat = (a - b) / a; // P(|S| ≤ a − b)
        if (p <= flat) return p * a;
        // In the sloped part: P(|S| > x) = (a + b − x)² / (4ab) for a − b ≤ x ≤ a + b.
        return a + b - Math.Sqrt(4 * a * b * (1 - p));
    }
}
