namespace Helipol.Engine.Kernel;

/// <summary>
/// Closed forms for the static (1/R) part of the reduced thin-wire kernel over a straight source
/// segment: with the observation point at axial offset d from the segment start and radial distance
/// ρ (including the wire radius, R = sqrt((w − d)² + ρ²)),
///   ∫₀ᴸ dw / R = asinh((L − d)/ρ) + asinh(d/ρ),
///   ∫₀ᴸ w dw / R = R(L) − R(0) + d ∫₀ᴸ dw / R
/// (elementary integrals; see e.g. Gibson, *The Method of Moments in Electromagnetics*, thin-wire chapter).
/// </summary>
internal static class StaticLineIntegrals
{
    /// <summary>
    /// Returns (∫₀¹ dv/R, ∫₀¹ v dv/R) over the segment from <paramref name="start"/> along unit
    /// <paramref name="direction"/> of <paramref name="lengthM"/>, v the fraction of its length.
    /// </summary>
    public static (double Constant, double Linear) Over(Vector3 observation, Vector3 start, Vector3 direction, double lengthM, double radiusSquared)
    {
        Vector3 r = observation - start;
        double d = Vector3.Dot(r, direction);
        double rho2 = Math.Max(r.LengthSquared - d * d, 0) + radiusSquared;
        double rho = Math.Sqrt(rho2);
        double i0 = Math.Asinh((lengthM - d) / rho) + Math.Asinh(d / rho);
        double rEnd = Math.Sqrt((lengthM - d) * (lengthM - d) + rho2);
        double rStart = Math.Sqrt(d * d + rho2);
        double i1 = rEnd - rStart + d * i0;
        return (i0 / lengthM, i1 / (lengthM * lengthM));
    }
}
