namespace Helipol.Geometry;

/// <summary>
/// Triangle mesh of the printed former, built parametrically with no mesh booleans. The outer wall
/// is a structured grid in (sheared azimuth s, height z): a grid vertex sits at azimuth s + shear(z),
/// so every groove is a fixed set of grid columns whose radius drops to the groove floor. The bore
/// is a plain grid with a lead-in chamfer, and the two end faces join outer and bore rings by
/// merging them in azimuth order. The result is one closed tube: watertight and 2-manifold by
/// construction. Grid steps keep every triangle within <see cref="ChordToleranceMm"/> of the true
/// surface: a chord spanning Δφ at radius r departs from the arc by r(1 − cos(Δφ/2)).
/// </summary>
public static class FormerMesh
{
    public const double ChordToleranceMm = 0.005;

    public static TriangleMesh Build(FormerSleeve f, int elementCount)
    {
        var maxStep = 2 * Math.Acos(1 - ChordToleranceMm / f.OuterRadiusMm);
        var columns = OuterColumns(f, elementCount, maxStep / 2);
        var rows = OuterRows(f, maxStep / 2);
        var vertices = new List<Point3>();
        var triangles = new List<(int, int, int)>();
        var m = columns.Count;

        // Outer wall.
        for (var r = 0; r < rows.Count; r++)
        {
            var z = rows[r];
            var shear = f.ShearRad(z);
            var depth = f.GrooveDepthMm * f.DepthFraction(z);
            foreach (var s in columns)
            {
                var radius = f.OuterRadiusMm - depth * GrooveProfile(f, s, elementCount) - FormerSleeve.MarkDepthMm * f.Mark.Fraction(s, z);
                vertices.Add(Point3.Cylindrical(radius, s + shear, z));
            }
        }
        for (var r = 0; r + 1 < rows.Count; r++)
            for (var c = 0; c < m; c++)
            {
                int a = r * m + c, b = r * m + (c + 1) % m, cc = (r + 1) * m + (c + 1) % m, d = (r + 1) * m + c;
                triangles.Add((a, b, cc));
                triangles.Add((a, cc, d));
            }

        // Bore: lead-in chamfer from radius bore + chamfer at the bottom face to the bore radius.
        var boreStep = 2 * Math.Acos(1 - ChordToleranceMm / (f.BoreRadiusMm + f.ChamferMm));
        var k = Math.Max(16, (int)Math.Ceiling(2 * Math.PI / boreStep));
        var boreRows = new[] { (Z: 0.0, R: f.BoreRadiusMm + f.ChamferMm), (Z: f.ChamferMm, R: f.BoreRadiusMm), (Z: f.HeightMm, R: f.BoreRadiusMm) };
        var boreStart = vertices.Count;
        foreach (var (z, radius) in boreRows)
            for (var c = 0; c < k; c++)
                vertices.Add(Point3.Cylindrical(radius, 2 * Math.PI * c / k, z));
        for (var r = 0; r + 1 < boreRows.Length; r++)
            for (var c = 0; c < k; c++)
            {
                int a = boreStart + r * k + c, b = boreStart + r * k + (c + 1) % k, cc = boreStart + (r + 1) * k + (c + 1) % k, d = boreStart + (r + 1) * k + c;
                triangles.Add((a, d, cc));
                triangles.Add((a, cc, b));
            }

        // End faces.
        var outerBottom = Enumerable.Range(0, m).ToList();
        var outerTop = Enumerable.Range((rows.Count - 1) * m, m).ToList();
        var boreBottom = Enumerable.Range(boreStart, k).ToList();
        var boreTop = Enumerable.Range(boreStart + 2 * k, k).ToList();
        JoinRings(vertices, outerTop, boreTop, triangles, facingUp: true);
        JoinRings(vertices, outerBottom, boreBottom, triangles, facingUp: false);
        return new TriangleMesh(vertices, triangles);
    }

    /// <summary>Fraction of groove depth at sheared azimuth s: the nearest groove counts.</summary>
    private static double GrooveProfile(FormerSleeve f, double s, int n)
    {
        var pitch = 2 * Math.PI / n;
        var k = Math.Round(s / pitch);
        return f.ProfileFraction(s - k * pitch);
    }

    private static List<double> OuterColumns(FormerSleeve f, int n, double maxStep)
    {
        var cols = new List<double>();
        for (var k = 0; k < n; k++)
        {
            var c = 2 * Math.PI * k / n;
            var w = f.GrooveHalfWidthRad;
            var t = f.GrooveWallTaperRad;
            cols.AddRange([c - w - t, c - w, c + w, c + w + t]);
        }
        cols.AddRange(f.Mark.ColumnsRad);
        var wrapped = cols.Select(c => ((c % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI)).Order().ToList();
        return Refine(wrapped, maxStep, closeAt: 2 * Math.PI);
    }

    private static List<double> OuterRows(FormerSleeve f, double maxShearStep)
    {
        var lo = f.GrooveLowerEndMm - f.RunOutBelowMm;
        var hi = f.GrooveUpperEndMm + f.RunOutAboveMm;
        var keys = new List<double> { 0, f.HeightMm, lo, f.GrooveLowerEndMm, f.GrooveUpperEndMm, hi };
        keys.AddRange(f.Mark.RowsMm);
        var sorted = keys.Select(z => Math.Clamp(z, 0, f.HeightMm)).Order().ToList();
        // Rows only need refining where the grid shears; there the azimuth step per row is limited.
        var maxDz = Math.Abs(f.ShearRadPerMm) > 0 ? maxShearStep / Math.Abs(f.ShearRadPerMm) : double.PositiveInfinity;
        var rows = new List<double>();
        for (var i = 0; i < sorted.Count; i++)
        {
            if (rows.Count > 0 && sorted[i] - rows[^1] < 1e-6) continue;
            if (rows.Count > 0)
            {
                var a = rows[^1];
                var b = sorted[i];
                var sheared = a >= lo - 1e-9 && b <= hi + 1e-9;
                var pieces = sheared ? (int)Math.Ceiling((b - a) / maxDz) : 1;
                for (var p = 1; p < pieces; p++) rows.Add(a + (b - a) * p / pieces);
            }
            rows.Add(sorted[i]);
        }
        return rows;
    }

    /// <summary>Drops near-duplicates and splits every gap wider than maxStep evenly; the gap from
    /// the last value round to the first (+closeAt) is split too.</summary>
    private static List<double> Refine(List<double> sorted, double maxStep, double closeAt)
    {
        var unique = new List<double>();
        foreach (var v in sorted)
            if (unique.Count == 0 || v - unique[^1] > 1e-7) unique.Add(v);
        if (unique.Count > 1 && unique[0] + closeAt - unique[^1] < 1e-7) unique.RemoveAt(unique.Count - 1);
        var result = new List<double>();
        for (var i = 0; i < unique.Count; i++)
        {
            var a = unique[i];
            var b = i + 1 < unique.Count ? unique[i + 1] : unique[0] + closeAt;
            result.Add(a);
            var pieces = (int)Math.Ceiling((b - a) / maxStep);
            for (var p = 1; p < pieces; p++) result.Add(a + (b - a) * p / pieces);
        }
        return result;
    }

    /// <summary>
    /// Triangulates the flat ring between an outer and an inner loop of vertices at one height by
    /// walking both in azimuth order and always advancing the loop whose next vertex comes first.
    /// </summary>
    internal static void JoinRings(List<Point3> v, List<int> outer, List<int> inner, List<(int, int, int)> tris, bool facingUp)
    {
        var o = Unwrapped(v, outer);
        var n = Unwrapped(v, inner);
        // Start the inner walk at the first inner vertex not before the outer start.
        while (n.Angles[0] > o.Angles[0]) { n = Rotate(n, -1); }
        while (n.Angles[1] <= o.Angles[0]) { n = Rotate(n, 1); }
        int i = 0, j = 0;
        var mo = o.Ids.Count;
        var mi = n.Ids.Count;
        while (i < mo || j < mi)
        {
            var nextOuter = i < mo ? o.Angles[i + 1] : double.PositiveInfinity;
            var nextInner = j < mi ? n.Angles[j + 1] : double.PositiveInfinity;
            (int, int, int) t;
            if (nextOuter <= nextInner) { t = (o.Id(i), o.Id(i + 1), n.Id(j)); i++; }
            else { t = (o.Id(i), n.Id(j + 1), n.Id(j)); j++; }
            tris.Add(facingUp ? t : (t.Item1, t.Item3, t.Item2));
        }
    }

    private sealed record Loop(List<int> Ids, List<double> Angles)
    {
        public int Id(int i) => Ids[((i % Ids.Count) + Ids.Count) % Ids.Count];
    }

    /// <summary>The loop from its smallest azimuth, angles made increasing, with the first repeated
    /// one turn later at the end.</summary>
    private static Loop Unwrapped(List<Point3> v, List<int> ids)
    {
        var angles = ids.Select(id => Math.Atan2(v[id].Y, v[id].X)).ToList();
        var start = angles.IndexOf(angles.Min());
        var order = Enumerable.Range(0, ids.Count).Select(i => (start + i) % ids.Count).ToList();
        var outIds = order.Select(i => ids[i]).ToList();
        var outAngles = new List<double>();
        foreach (var i in order)
        {
            var a = angles[i];
            while (outAngles.Count > 0 && a < outAngles[^1]) a += 2 * Math.PI;
            outAngles.Add(a);
        }
        outAngles.Add(outAngles[0] + 2 * Math.PI);
        return new Loop(outIds, outAngles);
    }

    /// <summary>Shifts the loop's start by one vertex forward (+1) or back (−1), keeping angles increasing.</summary>
    private static Loop Rotate(Loop l, int by)
    {
        var count = l.Ids.Count;
        var baseAngles = l.Angles.Take(count).ToList();
        List<int> ids;
        List<double> angles;
        if (by > 0)
        {
            ids = l.Ids.Skip(1).Append(l.Ids[0]).ToList();
            angles = baseAngles.Skip(1).Append(baseAngles[0] + 2 * Math.PI).ToList();
        }
        else
        {
            ids = l.Ids.Skip(count - 1).Concat(l.Ids.Take(count - 1)).ToList();
            angles = new[] { baseAngles[^1] - 2 * Math.PI }.Concat(baseAngles.Take(count - 1)).ToList();
        }
        angles.Add(angles[0] + 2 * Math.PI);
        return new Loop(ids, angles);
    }
}
