namespace Helipol.Design.Mismatch;

/// <summary>
/// Polarization loss factor between a wave and a receiving antenna, each described by a signed
/// axial ratio r (same hand, same sign) and a tilt τ:
/// <code>PLF = 1/2 + [4 r1 r2 + (1 − r1²)(1 − r2²) cos 2(τ1 − τ2)] / [2 (1 + r1²)(1 + r2²)]</code>
/// (the general form for two elliptical polarizations; Stutzman, <i>Polarization in
/// Electromagnetic Systems</i>, ch. 4). Linear is the limit r → ∞, evaluated in closed form here
/// so no infinity enters the arithmetic.
/// </summary>
public static class PolarizationMismatch
{
    /// <summary>Loss factor in 0..1 (1 = matched).</summary>
    public static double LossFactor(PolarizationState a, PolarizationState b)
    {
        var cos2 = Math.Cos(2 * (a.TiltDeg - b.TiltDeg) * Math.PI / 180);
        // Write r as ratio of (p, q) with r = p/q so linear is (1, 0): every term stays finite.
        var (p1, q1) = Fraction(a);
        var (p2, q2) = Fraction(b);
        var numerator = 4 * p1 * q1 * p2 * q2 + (q1 * q1 - p1 * p1) * (q2 * q2 - p2 * p2) * cos2;
        var denominator = 2 * (q1 * q1 + p1 * p1) * (q2 * q2 + p2 * p2);
        return Math.Clamp(0.5 + numerator / denominator, 0, 1);
    }

    /// <summary>Loss in dB (≥ 0); a complete mismatch returns +∞.</summary>
    public static double LossDb(PolarizationState a, PolarizationState b)
    {
        var f = LossFactor(a, b);
        return f <= 0 ? double.PositiveInfinity : -10 * Math.Log10(f);
    }

    /// <summary>
    /// Best and worst loss factor over every relative tilt, for antennas whose orientation about the
    /// link axis is not controlled (a whip on a moving vehicle). cos 2Δτ spans −1..1.
    /// </summary>
    public static (double Best, double Worst) LossFactorRangeOverTilt(PolarizationState a, PolarizationState b)
    {
        var aligned = LossFactor(a with { TiltDeg = 0 }, b with { TiltDeg = 0 });
        var crossed = LossFactor(a with { TiltDeg = 0 }, b with { TiltDeg = 90 });
        return (Math.Max(aligned, crossed), Math.Min(aligned, crossed));
    }

    private static (double P, double Q) Fraction(PolarizationState s)
    {
        if (s.Hand == PolarizationHand.Linear) return (1, 0);
        var r = s.SignedAxialRatio;
        // Scale so p² + q² = 1 for numerical balance; the formula is homogeneous in (p, q).
        var norm = Math.Sqrt(1 + r * r);
        return (r / norm, 1 / norm);
    }
}
