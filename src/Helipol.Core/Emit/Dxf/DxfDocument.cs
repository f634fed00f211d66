using System.Globalization;
using System.Text;
using Helipol.Geometry;

namespace Helipol.Emit.Dxf;

/// <summary>A layer: a name of this tool's own, an AutoCAD Color Index and what it is for.</summary>
public sealed record DxfLayer(string Name, int ColorIndex);

/// <summary>
/// Writes a DXF drawing in the AutoCAD Release 12 form (AC1009), which laser, CNC and drawing
/// programs still open without complaint. Structure and group codes follow the published AutoCAD
/// DXF Reference: HEADER (version, $INSUNITS = 4 for millimetres, $MEASUREMENT = 1 for metric,
/// drawing extents), TABLES (LTYPE, LAYER, STYLE), an empty BLOCKS section and ENTITIES (LINE,
/// CIRCLE, TEXT, and POLYLINE/VERTEX/SEQEND with bulges for arcs). Numbers are written in the
/// invariant culture with up to 6 decimals, so the bytes depend only on the geometry.
/// </summary>
public sealed class DxfDocument
{
    private readonly IReadOnlyList<DxfLayer> _layers;
    private readonly StringBuilder _entities = new();
    private double _minX = double.PositiveInfinity, _minY = double.PositiveInfinity;
    private double _maxX = double.NegativeInfinity, _maxY = double.NegativeInfinity;

    public DxfDocument(IReadOnlyList<DxfLayer> layers) => _layers = layers;

    public void Line(string layer, Point2 a, Point2 b)
    {
        Entity("LINE", layer);
        Xy(10, a); Xy(11, b);
        Grow(a); Grow(b);
    }

    public void Circle(string layer, Point2 centre, double radius)
    {
        Entity("CIRCLE", layer);
        Xy(10, centre); Num(40, radius);
        Grow(centre - new Point2(radius, radius)); Grow(centre + new Point2(radius, radius));
    }

    /// <summary>Left-aligned single-line text with its baseline starting at <paramref name="at"/>.</summary>
    public void Text(string layer, Point2 at, double heightMm, string text)
    {
        Entity("TEXT", layer);
        Xy(10, at); Num(40, heightMm); Str(1, text); Str(7, "STANDARD");
        Grow(at); Grow(at + new Point2(0.7 * heightMm * text.Length, heightMm));
    }

    /// <summary>A closed polyline; bulge[i] = tan(included angle / 4) of the arc from vertex i to
    /// the next (positive = counter-clockwise), 0 for a straight segment.</summary>
    public void ClosedPolyline(string layer, IReadOnlyList<Point2> vertices, IReadOnlyList<double> bulges)
    {
        Entity("POLYLINE", layer);
        Int(66, 1); Xy(10, new Point2(0, 0)); Int(70, 1);
        for (var i = 0; i < vertices.Count; i++)
        {
            Entity("VERTEX", layer);
            Xy(10, vertices[i]);
            if (bulges[i] != 0) Num(42, bulges[i]);
            Grow(vertices[i]);
        }
        Entity("SEQEND", layer);
    }

    public void Rectangle(string layer, Point2 lowerLeft, double width, double height) =>
        ClosedPolyline(layer, [lowerLeft, lowerLeft + new Point2(width, 0), lowerLeft + new Point2(width, height), lowerLeft + new Point2(0, height)], [0, 0, 0, 0]);

    public byte[] ToBytes()
    {
        var sb = new StringBuilder();
        void P(int code, string value) => sb.Append(code.ToString(CultureInfo.InvariantCulture)).Append('\n').Append(value).Append('\n');
        if (double.IsInfinity(_minX)) { _minX = _minY = 0; _maxX = _maxY = 0; }
        P(0, "SECTION"); P(2, "HEADER");
        P(9, "$ACADVER"); P(1, "AC1009");
        P(9, "$INSUNITS"); P(70, "4");
        P(9, "$MEASUREMENT"); P(70, "1");
        P(9, "$EXTMIN"); P(10, F(_minX)); P(20, F(_minY)); P(30, "0");
        P(9, "$EXTMAX"); P(10, F(_maxX)); P(20, F(_maxY)); P(30, "0");
        P(0, "ENDSEC");
        P(0, "SECTION"); P(2, "TABLES");
        P(0, "TABLE"); P(2, "LTYPE"); P(70, "1");
        P(0, "LTYPE"); P(2, "CONTINUOUS"); P(70, "0"); P(3, "Solid line"); P(72, "65"); P(73, "0"); P(40, "0.0");
        P(0, "ENDTAB");
        P(0, "TABLE"); P(2, "LAYER"); P(70, (_layers.Count + 1).ToString(CultureInfo.InvariantCulture));
        P(0, "LAYER"); P(2, "0"); P(70, "0"); P(62, "7"); P(6, "CONTINUOUS");
        foreach (var l in _layers)
        {
            P(0, "LAYER"); P(2, l.Name); P(70, "0"); P(62, l.ColorIndex.ToString(CultureInfo.InvariantCulture)); P(6, "CONTINUOUS");
        }
        P(0, "ENDTAB");
        P(0, "TABLE"); P(2, "STYLE"); P(70, "1");
        P(0, "STYLE"); P(2, "STANDARD"); P(70, "0"); P(40, "0.0"); P(41, "1.0"); P(50, "0.0"); P(71, "0"); P(42, "2.5"); P(3, "txt"); P(4, "");
        P(0, "ENDTAB");
        P(0, "ENDSEC");
        P(0, "SECTION"); P(2, "BLOCKS"); P(0, "ENDSEC");
        P(0, "SECTION"); P(2, "ENTITIES");
        sb.Append(_entities);
        P(0, "ENDSEC");
        P(0, "EOF");
        return Encoding.ASCII.GetBytes(sb.ToString());
    }

    public static string F(double v)
    {
        var s = Math.Round(v, 6).ToString("0.0#####", CultureInfo.InvariantCulture);
        return s == "-0.0" ? "0.0" : s;
    }

    private void Entity(string type, string layer) { Str(0, type); Str(8, layer); }
    private void Xy(int code, Point2 p) { Num(code, p.X); Num(code + 10, p.Y); Num(code + 20, 0); }
    private void Num(int code, double v) => Str(code, F(v));
    private void Int(int code, int v) => Str(code, v.ToString(CultureInfo.InvariantCulture));
    private void Str(int code, string v) => _entities.Append(code.ToString(CultureInfo.InvariantCulture)).Append('\n').Append(v).Append('\n');

    private void Grow(Point2 p)
    {
        _minX = Math.Min(_minX, p.X); _minY = Math.Min(_minY, p.Y);
        _maxX = Math.Max(_maxX, p.X); _maxY = Math.Max(_maxY, p.Y);
    }
}
