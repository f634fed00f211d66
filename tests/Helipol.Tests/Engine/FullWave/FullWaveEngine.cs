using Helipol.Engine;

namespace Helipol.Tests.Engine.FullWave;

/// <summary>
/// The engine on the full-wave reference cases (docs/fullwave/README.md): a straight wire along z,
/// flat ends, centre-fed across the same 0.5 mm gap the FDTD runs use, optionally coated.
/// </summary>
internal static class FullWaveEngine
{
    /// <summary>The FDTD runs' feed: a fixed 0.5 mm gap at the centre (docs/fullwave/README.md).</summary>
    public const double FeedGapM = 0.5e-3;


    public static MeshedModel FedDipole(double lengthM, double radiusM, DielectricCoating? coating, double maxFrequencyHz) =>
        MeshedModel.Create(new WireModel(
            [new Wire([new Vector3(0, 0, -lengthM / 2), new Vector3(0, 0, 0), new Vector3(0, 0, lengthM / 2)], radiusM, PerfectConductor.Instance, coating, WireEnds.Flat)],
            GroundPlane.None, [new VoltageSource(new Vector3(0, 0, 0), 1, FeedGapM)]), maxFrequencyHz);

    /// <summary>
    /// The first zero of the input reactance between the bounds (rising through zero), found by a
    /// coarse scan and then the secant method; and the resistance there. The wire is meshed at the
    /// engine's default density for <paramref name="hiHz"/>, as a design swept up to there would be
    /// (the end caps make the resonance depend slightly on the density, README "The engine").
    /// </summary>
    public static (double FrequencyHz, double ResistanceOhm) Resonance(double lengthM, double radiusM, DielectricCoating? coating, double loHz, double hiHz)
    {
        var mesh = FedDipole(lengthM, radiusM, coating, hiHz);
        System.Numerics.Complex Z(double f) => MomSolver.Solve(mesh, f).InputImpedanceOhm();
        const int steps = 16;
        double fPrev = loHz, xPrev = Z(loHz).Imaginary;
        for (int i = 1; i <= steps; i++)
        {
            double f = loHz + (hiHz - loHz) * i / steps, x = Z(f).Imaginary;
            if (xPrev < 0 && x >= 0)
            {
                double a = fPrev, b = f, xa = xPrev, xb = x;
                for (int k = 0; k < 30 && b - a > 1e3; k++)
                {
                    double m = a - xa * (b - a) / (xb - xa), xm = Z(m).Imaginary;
                    if (xm < 0) { a = m; xa = xm; } else { b = m; xb = xm; }
                    if (Math.Abs(xm) < 1e-6) { a = b = m; break; }
                }
                double fr = a == b ? a : a - xa * (b - a) / (xb - xa);
                return (fr, Z(fr).Real);
            }
            fPrev = f; xPrev = x;
        }
        throw new InvalidOperationException($"no reactance zero between {loHz / 1e6} and {hiHz / 1e6} MHz");
    }
}
