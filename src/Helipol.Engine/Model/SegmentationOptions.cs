namespace Helipol.Engine;

/// <summary>
/// How wires are cut into segments. Each polyline edge gets enough equal segments to reach
/// <paramref name="SegmentsPerWavelength"/> at the highest frequency, and at least
/// <paramref name="MinimumSegmentsPerWire"/> over the whole wire. Segments must stay longer than
/// <paramref name="MinimumLengthInRadii"/> wire radii: when the density asks for shorter ones the count
/// is lowered, and a wire that cannot meet it is refused. The tube kernel on each wire's own pairs
/// (Kernel/ExactStaticKernel.cs) keeps segments of one or two radii accurate, where the reduced kernel
/// alone needed about four (Harrington). The default density, 30 per wavelength, puts the broadside
/// resonance of the full-wave reference wires (docs/fullwave) within 0.5 % of NEC-2's extended kernel
/// (Nec2Comparison/LoneElementTests); 20 left the 24 mm × 0.5 mm wire 0.6 % high.
/// </summary>
public sealed record SegmentationOptions(
    double SegmentsPerWavelength = 30,
    int MinimumSegmentsPerWire = 3,
    double MinimumLengthInRadii = 2)
{
    public static SegmentationOptions Default { get; } = new();
}
