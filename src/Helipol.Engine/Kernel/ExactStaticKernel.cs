namespace Helipol.Engine.Kernel;

/// <summary>
/// The static part of the exact cylindrical (tube) kernel over a straight source segment. With the
/// current spread evenly round a tube of radius a and the field tested on the same tube, two points
/// at axial offset z and angle φ apart are R = sqrt(z² + 4a² sin²(φ/2)) apart, and the kernel is the
/// average of 1/R over φ (the exact kernel of Pocklington's and Hallén's equations; the references here
/// are from memory: Fikioris and Wu, "On the application of numerical methods to Hallén's equation",
/// IEEE Trans. AP 49, 2001, on why the reduced kernel R = sqrt(z² + a²) has no solution as segments
/// shrink below the radius, and Werner, IEEE Trans. AP 44, 1996, on integrating the exact kernel).
/// Its logarithmic singularity at z = 0 makes the Galerkin system well posed at any segment length,
/// which the reduced kernel's smooth peak does not. The figures in Nec2Comparison/LoneElementTests
/// (an open tube converging as segments shrink to a fifth of the radius) check it here.
///
/// Here the axial integral over the source segment is done in closed form for each φ (the asinh form of
/// <see cref="StaticLineIntegrals"/> with radius² = 4a² sin²(φ/2)), and the φ average by
/// Gauss–Legendre after φ = π t², which turns the logarithm at φ = 0 (when the observation point lies on
/// the source's axis) into a smooth t·log t. By symmetry φ runs over [0, π] only.
/// </summary>
internal static class ExactStaticKernel
{
    private const int Order = 16;
    private static readonly double[] SinSquared, Weight;

    static ExactStaticKernel()
    {
        var (t, w) = GaussLegendre.OnUnitInterval(Order);
        SinSquared = new double[Order];
        Weight = new double[Order];
        for (int i = 0; i < Order; i++)
        {
            double phi = Math.PI * t[i] * t[i];
            double s = Math.Sin(phi / 2);
            SinSquared[i] = s * s;
            // (1/π) ∫₀^π dφ = ∫₀¹ 2t dt.
            Weight[i] = w[i] * 2 * t[i];
        }
    }

    /// <summary>(∫₀¹ K dv, ∫₀¹ v K dv) of the tube kernel's static part, in the units of <see cref="StaticLineIntegrals.Over"/>.</summary>
    public static (double Constant, double Linear) Over(Vector3 observation, Vector3 start, Vector3 direction, double lengthM, double radiusSquared)
    {
        double c0 = 0, c1 = 0;
        for (int i = 0; i < Order; i++)
        {
            var (a, b) = StaticLineIntegrals.Over(observation, start, direction, lengthM, 4 * radiusSquared * SinSquared[i]);
            c0 += Weight[i] * a;
            c1 += Weight[i] * b;
        }
        return (c0, c1);
    }
}
