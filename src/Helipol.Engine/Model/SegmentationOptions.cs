namespace Helipol.Engine;

/// <summary>
/// How wires are cut into segments. Each polyline edge gets enough equal segments to reach
/// <paramref name="SegmentsPerWavelength"/> at the highest frequency, and at least
/// <paramref name="MinimumSegmentsPerWire"/> over the whole wire. Segments must stay longer than
/// <paramref name="MinimumLengthInRadii"/> wire radii (thin-wire kernel validity, Harrington): when the
/// density asks for shorter ones the count is lowered, and a wire that cannot meet it is refused.
/// </summary>
public sealed record SegmentationOptions(
    double SegmentsPerWavelength = 20,
    int MinimumSegmentsPerWire = 3,
    double MinimumLengthInRadii = 4)
{
    public static SegmentationOptions Default { get; } = new();
}
