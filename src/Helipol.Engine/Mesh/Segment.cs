namespace Helipol.Engine.Mesh;

/// <summary>
/// One straight piece of wire between two nodes. Position along it is u ∈ [0, 1] from
/// <see cref="Start"/> to <see cref="End"/>.
/// </summary>
internal sealed class Segment
{
    private readonly Vector3 _start, _end;

    public required Vector3 Start { get => _start; init { _start = value; Update(); } }
    public required Vector3 End { get => _end; init { _end = value; Update(); } }
    public required double RadiusM { get; init; }
    public required int WireIndex { get; init; }
    public required int StartNode { get; init; }
    public required int EndNode { get; init; }
    public required WireImpedance Impedance { get; init; }

    /// <summary>Length, m (cached: the quadrature tables read it for every pair).</summary>
    public double LengthM { get; private set; }

    /// <summary>Unit vector from start to end.</summary>
    public Vector3 Direction { get; private set; }

    private void Update()
    {
        LengthM = Vector3.Distance(_start, _end);
        Direction = LengthM > 0 ? (1.0 / LengthM) * (_end - _start) : default;
        Centre = 0.5 * (_start + _end);
    }
    public Vector3 Centre { get; private set; }
    public Vector3 PointAt(double u) => Start + u * (End - Start);
}
