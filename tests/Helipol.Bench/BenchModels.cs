using Helipol.Engine;

namespace Helipol.Bench;

/// <summary>Structures timed by the bench (demo geometry, not a design).</summary>
internal static class BenchModels
{
    public const double FrequencyHz = 5.8e9;

    /// <summary>
    /// A centre-fed half-wave dipole with <paramref name="dipoleSegments"/> segments and five tilted
    /// 9-segment wire elements round it, like a whip carrying a parasitic sleeve. A thinner dipole lets
    /// the scaling series reach short segments without breaking the 4-radii rule.
    /// </summary>
    public static (WireModel Model, SegmentationOptions Options) DipoleWithFiveElements(int dipoleSegments = 82, double dipoleRadiusM = 0.05e-3)
    {
        double lambda = PhysicalConstants.SpeedOfLight / FrequencyHz;
        double half = lambda / 4;
        var wires = new List<Wire>
        {
            new(new Vector3[] { new(0, 0, -half), new(0, 0, 0), new(0, 0, half) }, dipoleRadiusM, PerfectConductor.Instance),
        };
        double ring = 6e-3, elementHeight = 0.24 * lambda;
        for (int e = 0; e < 5; e++)
        {
            var points = new List<Vector3>();
            double start = 2 * Math.PI * e / 5;
            for (int i = 0; i <= 9; i++)
            {
                double t = start + 0.9 * i / 9;
                points.Add(new Vector3(ring * Math.Cos(t), ring * Math.Sin(t), elementHeight * (i / 9.0 - 0.5)));
            }
            wires.Add(new Wire(points, 0.25e-3, PerfectConductor.Instance));
        }
        var model = new WireModel(wires, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, 0), 1) });
        // Each element polyline has 9 edges: one segment per edge. The dipole density gives its count.
        return (model, new SegmentationOptions(dipoleSegments / 2.0 * 4 - 1e-6, 9));
    }
}
