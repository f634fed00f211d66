namespace Helipol.Engine;

/// <summary>Sense of rotation per IEEE Std 145 (observer looking in the direction of propagation).</summary>
public enum PolarizationSense
{
    /// <summary>Right-hand: clockwise seen along the direction of propagation.</summary>
    Rhcp,

    /// <summary>Left-hand: counter-clockwise seen along the direction of propagation.</summary>
    Lhcp,

    /// <summary>Axial ratio above <see cref="Polarization.LinearAxialRatioDb"/>: no meaningful rotation.</summary>
    Linear,
}
