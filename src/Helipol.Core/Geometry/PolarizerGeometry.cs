using Helipol.Model;

namespace Helipol.Geometry;

/// <summary>
/// The polarizer as a physical object in millimetres. Convention: element wire axis at radius
/// R = outer diameter/2 + wire diameter/2 (the wire lies on the former); element k starts at
/// azimuth 360°·k/N; each element is a helical arc of wire length L climbing rise h, centred at
/// the centre height; unrolled on the cylinder of radius R it is a straight line, so its
/// horizontal arc length is sqrt(L² − h²) and its arc angle sqrt(L² − h²)/R.
/// </summary>
public sealed class PolarizerGeometry
{
    public PolarizerBuildInput Input { get; }
    public double ElementAxisRadiusMm { get; }
    public double FormerOuterRadiusMm => Input.FormerOuterDiameterMm / 2;
    public double FormerBoreRadiusMm => Input.FormerBoreDiameterMm / 2;
    public double HorizontalArcLengthMm { get; }
    public double ArcAngleRad { get; }
    /// <summary>Pitch angle from the horizontal at the wire axis, atan(h / sqrt(L² − h²)).</summary>
    public double PitchAngleRad { get; }
    public int WindingSign => Input.Winding == Winding.Right ? 1 : -1;
    /// <summary>Spacing between element starts along the circumference at the wire axis, mm.</summary>
    public double ElementSpacingMm => 2 * Math.PI * ElementAxisRadiusMm / Input.ElementCount;
    /// <summary>
    /// Radius of curvature of the helix, the radius a straight wire is bent to before it is laid on
    /// the former: for a helix of radius R and rise c per radian, κ = R/(R² + c²) (differential
    /// geometry of the circular helix, any calculus text), so the bend radius is (R² + c²)/R.
    /// </summary>
    public double BendRadiusMm { get; }
    public IReadOnlyList<HelicalElement> Elements { get; }

    public PolarizerGeometry(PolarizerBuildInput input)
    {
        BuildInputCheck.ThrowIfUnbuildable(input);
        Input = input;
        var L = input.ElementLengthMm;
        var h = input.ElementRiseMm;
        ElementAxisRadiusMm = input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2;
        HorizontalArcLengthMm = HelixArc.Run(L, h);
        ArcAngleRad = HorizontalArcLengthMm / ElementAxisRadiusMm;
        PitchAngleRad = HelixArc.PitchAngleRad(h, HorizontalArcLengthMm);
        var risePerRad = h / ArcAngleRad;
        BendRadiusMm = (ElementAxisRadiusMm * ElementAxisRadiusMm + risePerRad * risePerRad) / ElementAxisRadiusMm;
        var lower = input.CentreHeightMm - h / 2;
        Elements = Enumerable.Range(0, input.ElementCount)
            .Select(k => new HelicalElement(k + 1, ElementAxisRadiusMm, 2 * Math.PI * k / input.ElementCount,
                ArcAngleRad, WindingSign, lower, h))
            .ToList();
    }

    /// <summary>Heights of the ring faces from the bottom of the former: ring i spans faces i and i+1.</summary>
    public IReadOnlyList<double> RingFaceHeightsMm =>
        Enumerable.Range(0, Input.RingCount + 1).Select(i => Input.FormerHeightMm * i / Input.RingCount).ToList();

    public double RingThicknessMm => Input.FormerHeightMm / Input.RingCount;
}
