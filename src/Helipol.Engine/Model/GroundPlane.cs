namespace Helipol.Engine;

/// <summary>Ground under the structure.</summary>
public enum GroundPlane
{
    /// <summary>Free space.</summary>
    None,

    /// <summary>An infinite perfectly conducting plane at z = 0, handled by image theory; the structure must lie in z ≥ 0.</summary>
    PerfectAtZ0,
}
