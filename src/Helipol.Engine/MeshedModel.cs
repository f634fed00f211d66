using System.Numerics;
using Helipol.Engine.Kernel;
using Helipol.Engine.Mesh;

namespace Helipol.Engine;

/// <summary>
/// A checked and segmented <see cref="WireModel"/> with its frequency-independent quadrature
/// prepared. Build it once for the highest frequency of a sweep and solve it at any frequency up to
/// that one. Immutable and safe to share between threads.
/// </summary>
public sealed class MeshedModel
{
    private InteractionTable? _reference;

    private MeshedModel(WireModel model, double maxFrequencyHz, MeshBuilder.Result r)
    {
        Model = model;
        MaxFrequencyHz = maxFrequencyHz;
        Segments = r.Segments;
        Nodes = r.Nodes;
        UnknownCount = r.BasisCount;
        SourceBases = r.SourceBases;
        SourceVolts = r.SourceVolts;
        SourceGapBases = r.SourceGapBases;
        SourceGapWeights = r.SourceGapWeights;
        LoadBases = r.LoadBases;
        LoadImpedances = r.LoadImpedances;
        HasGround = model.Ground == GroundPlane.PerfectAtZ0;
        var ordered = r.Pieces.OrderBy(p => p.Segment).ThenBy(p => p.Basis).ToArray();
        PiecesBySegment = ordered;
        PieceStart = new int[Segments.Length + 1];
        foreach (var p in ordered) PieceStart[p.Segment + 1]++;
        for (int s = 0; s < Segments.Length; s++) PieceStart[s + 1] += PieceStart[s];
        Table = InteractionTable.BuildAdaptive(Segments, HasGround);
    }

    /// <summary>
    /// Checks <paramref name="model"/> and segments it for frequencies up to
    /// <paramref name="maxFrequencyHz"/>. Throws <see cref="ModelException"/> for an invalid model.
    /// </summary>
    public static MeshedModel Create(WireModel model, double maxFrequencyHz, SegmentationOptions? options = null) =>
        new(model, maxFrequencyHz, MeshBuilder.Build(model, maxFrequencyHz, options ?? SegmentationOptions.Default));

    /// <summary>The model this mesh was made from.</summary>
    public WireModel Model { get; }

    /// <summary>Highest frequency the segmentation was made for, Hz.</summary>
    public double MaxFrequencyHz { get; }

    /// <summary>Number of current unknowns (triangle bases).</summary>
    public int UnknownCount { get; }

    /// <summary>Number of segments.</summary>
    public int SegmentCount => Segments.Length;

    /// <summary>Whether the structure stands over a perfect ground at z = 0.</summary>
    public bool HasGround { get; }

    internal Segment[] Segments { get; }
    internal Vector3[] Nodes { get; }
    internal BasisPiece[] PiecesBySegment { get; }
    internal int[] PieceStart { get; }
    internal int[] SourceBases { get; }
    internal Complex[] SourceVolts { get; }
    /// <summary>Per source, the bases its gap drives and their V_m/V (Mesh/FeedGap.cs).</summary>
    internal int[][] SourceGapBases { get; }
    internal double[][] SourceGapWeights { get; }

    /// <summary>Current into source <paramref name="i"/>'s gap, Σ (V_m/V) I_m.</summary>
    internal Complex GapCurrent(int i, Complex[] basisCurrents)
    {
        Complex sum = 0;
        var b = SourceGapBases[i];
        var w = SourceGapWeights[i];
        for (int k = 0; k < b.Length; k++) sum += w[k] * basisCurrents[b[k]];
        return sum;
    }
    internal int[] LoadBases { get; }
    internal Complex[] LoadImpedances { get; }
    internal InteractionTable Table { get; }

    /// <summary>The plain every-pair quadrature table, built on first use (tests only).</summary>
    internal InteractionTable ReferenceTable => _reference ??= InteractionTable.BuildReference(Segments, HasGround);
}
