using Helipol.Engine;

namespace Helipol.Tests.Engine;

/// <summary>Reference structures for the engine checks, at a wavelength of 1 m unless stated.</summary>
internal static class Antennas
{
    /// <summary>f = c, so λ = 1 m and lengths read directly in wavelengths.</summary>
    public const double OneMetreWavelengthHz = PhysicalConstants.SpeedOfLight;

    /// <summary>Centre-fed straight dipole along z, a vertex at the feed so a node sits there.</summary>
    public static WireModel Dipole(double lengthM, double radiusM, Conductor? conductor = null, System.Numerics.Complex? volts = null,
        WireEnds ends = WireEnds.Flat) =>
        new(new[]
            {
                new Wire(new Vector3[] { new(0, 0, -lengthM / 2), new(0, 0, 0), new(0, 0, lengthM / 2) }, radiusM,
                    conductor ?? PerfectConductor.Instance, null, ends),
            },
            GroundPlane.None,
            new[] { new VoltageSource(new Vector3(0, 0, 0), volts ?? 1) });

    /// <summary>
    /// Half-wave dipoles along x (at z = 0) and y (at z = 0.005 λ, so they do not cross), the y one
    /// fed with the complex factor <paramref name="yPhase"/>·j relative to the x one.
    /// </summary>
    public static WireModel CrossedDipoles(double yPhase)
    {
        const double h = 0.24, dz = 0.005;
        return new WireModel(
            new[]
            {
                new Wire(new Vector3[] { new(-h, 0, 0), new(0, 0, 0), new(h, 0, 0) }, 1e-3, PerfectConductor.Instance),
                new Wire(new Vector3[] { new(0, -h, dz), new(0, 0, dz), new(0, h, dz) }, 1e-3, PerfectConductor.Instance),
            },
            GroundPlane.None,
            new[] { new VoltageSource(new Vector3(0, 0, 0), 1), new VoltageSource(new Vector3(0, 0, dz), new System.Numerics.Complex(0, yPhase)) });
    }

    /// <summary>Vertical monopole standing on a perfect ground, fed at its base.</summary>
    public static WireModel Monopole(double heightM, double radiusM) =>
        new(new[] { Wire.Straight(new Vector3(0, 0, 0), new Vector3(0, 0, heightM), radiusM) },
            GroundPlane.PerfectAtZ0,
            new[] { new VoltageSource(new Vector3(0, 0, 0), 1) });

    /// <summary>Regular polygon loop of <paramref name="sides"/> straight wires in the xy plane, fed at one vertex.</summary>
    public static WireModel PolygonLoop(double circumscribedRadiusM, int sides, double wireRadiusM)
    {
        var points = new List<Vector3>();
        for (int i = 0; i <= sides; i++)
        {
            double t = 2 * Math.PI * (i % sides) / sides;
            points.Add(new Vector3(circumscribedRadiusM * Math.Cos(t), circumscribedRadiusM * Math.Sin(t), 0));
        }
        return new WireModel(new[] { new Wire(points, wireRadiusM, PerfectConductor.Instance) }, GroundPlane.None,
            new[] { new VoltageSource(points[sides / 2], 1) });
    }

    public static double PolygonArea(double circumscribedRadiusM, int sides) =>
        0.5 * sides * circumscribedRadiusM * circumscribedRadiusM * Math.Sin(2 * Math.PI / sides);

    public static MomSolution Solve(WireModel model, double frequencyHz = OneMetreWavelengthHz, SegmentationOptions? options = null) =>
        MomSolver.Solve(MeshedModel.Create(model, frequencyHz, options), frequencyHz);
}
