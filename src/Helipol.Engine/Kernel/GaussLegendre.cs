using MathNet.Numerics.Integration;

namespace Helipol.Engine.Kernel;

/// <summary>Gauss–Legendre nodes and weights on [0, 1], computed once per order (MathNet.Numerics).</summary>
internal static class GaussLegendre
{
    private static readonly (double[] Nodes, double[] Weights)?[] Cache = new (double[], double[])?[33];
    private static readonly (double[] Nodes, double[] Weights)?[] Clustered = new (double[], double[])?[33];
    private static readonly object Gate = new();

    public static (double[] Nodes, double[] Weights) OnUnitInterval(int order)
    {
        lock (Gate)
        {
            if (Cache[order] is { } hit) return hit;
            var rule = new GaussLegendreRule(0, 1, order);
            var result = (rule.Abscissas.ToArray(), rule.Weights.ToArray());
            Cache[order] = result;
            return result;
        }
    }

    /// <summary>
    /// Nodes on [0, 1] crowded towards both ends by u = t²(3 − 2t), du = 6t(1 − t) dt. The static
    /// part of a self or touching term varies on the scale of the wire radius near a segment end
    /// (a logarithmic peak); the substitution turns it into a smooth integrand for Gauss–Legendre.
    /// </summary>
    public static (double[] Nodes, double[] Weights) EndClustered(int order)
    {
        lock (Gate)
            if (Clustered[order] is { } hit) return hit;
        var (t, w) = OnUnitInterval(order);
        var u = new double[order];
        var wu = new double[order];
        for (int i = 0; i < order; i++)
        {
            u[i] = t[i] * t[i] * (3 - 2 * t[i]);
            wu[i] = w[i] * 6 * t[i] * (1 - t[i]);
        }
        lock (Gate) Clustered[order] = (u, wu);
        return (u, wu);
    }
}
