namespace Helipol.Engine.Mesh;

/// <summary>
/// One straight piece of wire between two nodes. Position along it is u ∈ [0, 1] from
/// <see cref="Start"/> to <see cref="End"/>.
/// </summary>
internal sealed class Segment
{
    public required Vector3 Start { get; init; }
    public required Vector3 End { get; init; }
    public required double RadiusM { get; init; }
    public required int WireIndex { get; init; }
    public required int StartNode { get; init; }
    public required int EndNode { get; init; }
    public required WireImpedance Impedance { get; init; }

    public double LengthM => Vector3.Distance(Start, End);
    public Vector3 Direction => (1.0 / LengthM) * (End - Start);
    public Vector3 Centre => 0.5 * (Start + End);
    public Vector3 PointAt(double u) => Start + u * (End - Start);
}
