using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// One mesh density per design. The engine cuts wires into segments of about λ/20 at the highest
/// frequency it is asked for, and a model's answer at one frequency moves a little with the segment
/// length (moment-method results converge as the segments shrink, Harrington ch. 4). If every run
/// sized its own mesh, the same frequency would give a different impedance and axial ratio in the
/// band table (meshed for the band's top) than in the sweep (meshed for the sweep's top). So every
/// stage of one design (search, band table, sweep, tolerance, analyze) segments for the design's
/// highest default frequency: the top of its sweep, band high + <c>solve.sweep.span</c> × centre.
/// Only a run asked for frequencies above that meshes finer, for its own top.
/// </summary>
public static class MeshDensity
{
    /// <summary>The frequency a design's wires are segmented for, Hz.</summary>
    public static double FrequencyHz(PolarizerDesign design) =>
        design.Band.HighHz + design.Solve.Sweep.SpanFraction * design.Band.CenterHz;

    /// <summary>The segmentation frequency for a run: the design's, or the run's own top when that is higher.</summary>
    public static double ForRun(double? designMeshHz, IReadOnlyList<double> frequenciesHz)
    {
        double top = frequenciesHz.Max();
        return designMeshHz is { } m && m > top ? m : top;
    }
}
