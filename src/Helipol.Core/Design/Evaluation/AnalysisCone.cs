using Helipol.Model;

namespace Helipol.Design;

/// <summary>Default elevation of the analysis cone: the horizon for a dipole; 20° for a monopole, because over a perfect ground the horizontal field vanishes at grazing (image theory).</summary>
public static class AnalysisCone
{
    public static double DefaultElevationRad(WhipKind kind) => (kind == WhipKind.Monopole ? 20 : 0) * Math.PI / 180;
}
