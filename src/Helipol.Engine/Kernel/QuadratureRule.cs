namespace Helipol.Engine.Kernel;

/// <summary>
/// A product rule over u (observation segment) × v (source segment) on [0, 1]², flattened to the
/// weights the four kernel moments need: w, w·u, w·v, w·u·v per point. A handful of rules serve every
/// pair of a mesh, so per pair only the distances are stored.
/// </summary>
internal sealed class QuadratureRule
{
    public QuadratureRule((double[] Nodes, double[] Weights) outer, (double[] Nodes, double[] Weights) inner)
    {
        Outer = outer;
        Inner = inner;
        int n = outer.Nodes.Length * inner.Nodes.Length;
        W = new double[n]; WU = new double[n]; WV = new double[n]; WUV = new double[n];
        int k = 0;
        for (int i = 0; i < outer.Nodes.Length; i++)
            for (int j = 0; j < inner.Nodes.Length; j++, k++)
            {
                double w = outer.Weights[i] * inner.Weights[j], u = outer.Nodes[i], v = inner.Nodes[j];
                W[k] = w; WU[k] = w * u; WV[k] = w * v; WUV[k] = w * u * v;
            }
    }

    public (double[] Nodes, double[] Weights) Outer { get; }
    public (double[] Nodes, double[] Weights) Inner { get; }
    public int PointCount => W.Length;
    public double[] W { get; }
    public double[] WU { get; }
    public double[] WV { get; }
    public double[] WUV { get; }
}
