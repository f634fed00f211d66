using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The coarse map of the search: the objective (dB, lower is better) over element length × rise
/// for one element count and former diameter, with the winding that scored best in each cell.
/// Cells that cannot be built hold NaN.
/// </summary>
public sealed record AxialRatioMap(int ElementCount, double OuterDiameterM, double[] LengthsM, double[] RisesM, double[,] ObjectiveDb, Winding[,] Winding)
{
    /// <summary>The best cell, or null if no cell can be built. Ties go to the lower index (deterministic).</summary>
    public (int I, int J)? Best()
    {
        (int, int)? best = null;
        double value = double.PositiveInfinity;
        for (int i = 0; i < LengthsM.Length; i++)
            for (int j = 0; j < RisesM.Length; j++)
                if (!double.IsNaN(ObjectiveDb[i, j]) && ObjectiveDb[i, j] < value) { value = ObjectiveDb[i, j]; best = (i, j); }
        return best;
    }

    /// <summary>Cells sorted best first (buildable only), for multi-start refinement.</summary>
    public IEnumerable<(int I, int J, double Value)> Ranked() =>
        from i in Enumerable.Range(0, LengthsM.Length)
        from j in Enumerable.Range(0, RisesM.Length)
        where !double.IsNaN(ObjectiveDb[i, j])
        orderby ObjectiveDb[i, j], i, j
        select (i, j, ObjectiveDb[i, j]);

    public double BestValue => Best() is { } b ? ObjectiveDb[b.I, b.J] : double.NaN;
}
