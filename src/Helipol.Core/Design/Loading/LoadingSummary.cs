using Helipol.Engine;
using Wire = Helipol.Engine.Wire;

namespace Helipol.Design.Loading;

/// <summary>
/// What the dielectric does to an element, for reports: the added inductance (physics and after
/// the calibration factor), each layer's share, and the shortening it asks for against a bare wire.
/// </summary>
/// <param name="WrapShare">S of the wrap alone (glue and former made air) over the sum of the three
/// layers alone; the layers do not add exactly (each changes the field the others see), so the
/// shares say which layer matters, not an exact split.</param>
/// <param name="ShorteningPercent">How much shorter a straight centre-fed element of the solved
/// length and wire resonates with this loading than bare: 100 (1 − f_loaded/f_bare), the
/// resonances being where the engine's input reactance crosses zero.</param>
public sealed record LoadingSummary(double Factor, double PhysicsHPerM, double AddedHPerM,
    double WrapShare, double GlueShare, double FormerShare, double ShorteningPercent)
{
    public static LoadingSummary For(Surroundings s, double elementLengthM)
    {
        var section = s.Section;
        // Three independent cold solves (each cached on its own key, so the order they finish in changes nothing).
        var layers = new[] { section.WrapOnly, section.GlueOnly, section.FormerOnly };
        var solved = new double[layers.Length];
        Parallel.For(0, layers.Length, Parallelism.Options(), k => solved[k] = AddedInductance.ShapeFactor(layers[k]));
        double wrap = solved[0], glue = solved[1], former = solved[2];
        double sum = wrap + glue + former;
        double Share(double x) => sum > 0 ? x / sum : 0;
        var coating = s.CoatingFor(section.WireRadiusM);
        double shortening = coating is null ? 0
            : 100 * (1 - Resonance(elementLengthM, section.WireRadiusM, coating) / Resonance(elementLengthM, section.WireRadiusM, null));
        return new LoadingSummary(s.CalibrationFactor, AddedInductance.HPerM(section), s.AddedInductanceHPerM,
            Share(wrap), Share(glue), Share(former), shortening);
    }

    /// <summary>
    /// First resonance of a straight centre-fed wire of length <paramref name="lengthM"/> (where the
    /// reactance crosses zero, by bisection between 0.6 and 1.1 of c/2L: a thin dipole's first
    /// resonance lies a few percent below c/2L, lower when loaded).
    /// </summary>
    public static double Resonance(double lengthM, double radiusM, DielectricCoating? coating)
    {
        double half = PhysicalConstants.SpeedOfLight / (2 * lengthM);
        double lo = 0.6 * half, hi = 1.1 * half;
        var wire = new Wire(new[] { new Vector3(0, 0, -lengthM / 2), new Vector3(0, 0, 0), new Vector3(0, 0, lengthM / 2) }, radiusM, PerfectConductor.Instance, coating);
        var model = new WireModel(new[] { wire }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, 0), 1) });
        var mesh = MeshedModel.Create(model, hi);
        double X(double f) => MomSolver.Solve(mesh, f).InputImpedanceOhm().Imaginary;
        if (X(lo) > 0 || X(hi) < 0) return double.NaN;
        for (int i = 0; i < 30; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (X(mid) < 0) lo = mid; else hi = mid;
        }
        return 0.5 * (lo + hi);
    }
}
