using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The wire path of one element by the geometry convention: a helical arc on the cylinder of radius
/// R (the wire axis on the former surface), total wire length L, climbing h, centred at height
/// z_c, starting (lower end) at azimuth φ0. Its arc angle is sqrt(L² − h²)/R (<see cref="HelixArc"/>). Right winding: the
/// azimuth increases as the element rises; left: it decreases.
/// </summary>
public static class ElementHelix
{
    /// <summary>Largest azimuth step between polyline points, rad; the chord then departs from the arc by R(1 − cos 0.1) ≈ 0.005 R.</summary>
    public const double MaxStepRad = 0.2;

    /// <summary>
    /// Polyline points (metres) with <paramref name="edges"/> straight edges, equally spaced along the
    /// helix (a helix has constant pitch, so equal parameter steps are equal lengths).
    /// </summary>
    public static Vector3[] Points(ElementPlacement e, double axisRadiusM, double centreHeightM, Winding winding, int edges)
    {
        double run = HelixArc.Run(e.LengthM, e.RiseM);
        double arc = run / axisRadiusM * (winding == Winding.Left ? -1 : 1);
        var points = new Vector3[edges + 1];
        for (int i = 0; i <= edges; i++)
        {
            double t = i / (double)edges;
            double phi = e.StartAzimuthRad + arc * t;
            double z = centreHeightM - e.RiseM / 2 + e.RiseM * t;
            points[i] = new Vector3(axisRadiusM * Math.Cos(phi), axisRadiusM * Math.Sin(phi), z);
        }
        return points;
    }

    /// <summary>
    /// How many straight edges an element gets: no edge longer than the engine's target segment
    /// (λ/segments-per-wavelength at the highest frequency), no azimuth step over
    /// <see cref="MaxStepRad"/>, at least 3; but never an edge shorter than the engine's minimum
    /// segment (a few wire radii, where the thin-wire kernel stops being valid).
    /// </summary>
    public static int EdgeCount(ElementPlacement e, double axisRadiusM, double wireRadiusM, double maxFrequencyHz, SegmentationOptions options)
    {
        double target = PhysicalConstants.SpeedOfLight / maxFrequencyHz / options.SegmentsPerWavelength;
        double run = HelixArc.Run(e.LengthM, e.RiseM);
        int wanted = Math.Max(options.MinimumSegmentsPerWire,
            Math.Max((int)Math.Ceiling(e.LengthM / target - 1e-9), (int)Math.Ceiling(run / axisRadiusM / MaxStepRad - 1e-9)));
        int allowed = (int)Math.Floor(e.LengthM / (options.MinimumLengthInRadii * wireRadiusM * 1.01));
        return Math.Max(1, Math.Min(wanted, allowed));
    }
}
