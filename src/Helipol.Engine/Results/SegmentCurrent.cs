using System.Numerics;

namespace Helipol.Engine;

/// <summary>
/// Current on one segment, linear between its ends, in amperes flowing from
/// <paramref name="StartM"/> towards <paramref name="EndM"/>.
/// </summary>
public readonly record struct SegmentCurrent(int WireIndex, Vector3 StartM, Vector3 EndM, Complex StartCurrentA, Complex EndCurrentA);
