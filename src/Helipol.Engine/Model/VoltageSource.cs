namespace Helipol.Engine;

/// <summary>
/// A voltage source across a gap of width <paramref name="GapM"/> centred on the segment node nearest
/// <paramref name="AtM"/> (0: a delta gap; null: half the wire radius; Mesh/FeedGap.cs). The voltage drives
/// current in the wire's own direction (first point towards last point) through that node. On a
/// wire end that touches a perfect ground the source sits between ground and wire (a monopole feed)
/// and drives current up, out of the ground. A source may not sit on a free end or a junction of three
/// or more wire ends.
/// </summary>
public sealed record VoltageSource(Vector3 AtM, System.Numerics.Complex Volts, double? GapM = null);
