namespace Helipol.Model;

/// <summary>
/// The one statement of how an element wire lies on its cylinder. A helical arc unrolled onto the
/// plane is a straight line, so wire length L, rise h and horizontal run r form a right triangle:
/// r = sqrt(L² − h²), arc angle = r / R, pitch angle above the horizontal = atan(h / r) (circular helix,
/// any calculus text). Lengths in any one unit; the callers pass metres (Model, Design) or mm (Geometry).
/// </summary>
public static class HelixArc
{
    /// <summary>Horizontal run (unrolled arc length) of a wire of length <paramref name="length"/> climbing <paramref name="rise"/>; 0 when the rise reaches the length.</summary>
    public static double Run(double length, double rise) => Math.Sqrt(Math.Max(0, length * length - rise * rise));

    /// <summary>Angle of the wire above the horizontal, rad, from its rise and horizontal run.</summary>
    public static double PitchAngleRad(double rise, double run) => Math.Atan2(rise, run);
}
