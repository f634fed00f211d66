using SkiaSharp;
using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>Drawing in millimetres on a canvas already scaled so one unit is one millimetre, with
/// y running down the page as on paper.</summary>
internal sealed class SheetPen : IDisposable
{
    private readonly SKPaint _stroke = new() { IsAntialias = true, Style = SKPaintStyle.Stroke, Color = SKColors.Black, StrokeWidth = 0.25f };
    private readonly SKPaint _fill = new() { IsAntialias = true, Style = SKPaintStyle.Fill, Color = SKColors.Black };
    private readonly SKPaint _text = new() { IsAntialias = true, Color = SKColors.Black };

    public SheetPen(SKCanvas canvas) => Canvas = canvas;
    public SKCanvas Canvas { get; }

    public void Line(double x0, double y0, double x1, double y1, double width = 0.25, SKColor? color = null, float[]? dash = null)
    {
        _stroke.StrokeWidth = (float)width;
        _stroke.Color = color ?? SKColors.Black;
        using var effect = dash is null ? null : SKPathEffect.CreateDash(dash, 0);
        _stroke.PathEffect = effect;
        Canvas.DrawLine((float)x0, (float)y0, (float)x1, (float)y1, _stroke);
        _stroke.PathEffect = null;
    }

    public void Rect(double x, double y, double w, double h, double width = 0.25, float[]? dash = null)
    {
        _stroke.StrokeWidth = (float)width;
        _stroke.Color = SKColors.Black;
        using var effect = dash is null ? null : SKPathEffect.CreateDash(dash, 0);
        _stroke.PathEffect = effect;
        Canvas.DrawRect((float)x, (float)y, (float)w, (float)h, _stroke);
        _stroke.PathEffect = null;
    }

    public void FillRect(double x, double y, double w, double h, SKColor color)
    {
        _fill.Color = color;
        Canvas.DrawRect((float)x, (float)y, (float)w, (float)h, _fill);
    }

    public void Circle(double cx, double cy, double r, double width = 0.25)
    {
        _stroke.StrokeWidth = (float)width;
        _stroke.Color = SKColors.Black;
        Canvas.DrawCircle((float)cx, (float)cy, (float)r, _stroke);
    }

    public void Path(SKPath path, double width = 0.25)
    {
        _stroke.StrokeWidth = (float)width;
        _stroke.Color = SKColors.Black;
        Canvas.DrawPath(path, _stroke);
    }

    public void StrokePath(SKPath path, double width, SKColor color)
    {
        _stroke.StrokeWidth = (float)width;
        _stroke.Color = color;
        Canvas.DrawPath(path, _stroke);
        _stroke.Color = SKColors.Black;
    }

    public void FillCircle(double cx, double cy, double r, SKColor color)
    {
        _fill.Color = color;
        Canvas.DrawCircle((float)cx, (float)cy, (float)r, _fill);
    }

    public void FillPath(SKPath path, SKColor color)
    {
        _fill.Color = color;
        Canvas.DrawPath(path, _fill);
    }

    /// <summary>While set, text whose box is not wholly inside this window (in the current drawing
    /// coordinates) is left out: a tile of a large drawing shows only the labels it holds whole,
    /// its neighbour (overlapping it) shows the rest.</summary>
    public SKRect? TextWindow { get; set; }

    /// <summary>Advance width of a text at a size, mm.</summary>
    public static double TextWidth(string s, double sizeMm)
    {
        using var font = Font(sizeMm);
        return font.MeasureText(s);
    }

    private static SKFont Font(double sizeMm) =>
        // Sizes are in millimetres, so glyph hinting to whole units would wreck the spacing.
        new(SheetFonts.Typeface, (float)sizeMm) { Subpixel = true, LinearMetrics = true, Hinting = SKFontHinting.None };

    /// <summary>Text with its baseline at y; size is the font's em size in mm.</summary>
    public void Text(string s, double x, double y, double sizeMm, SKTextAlign align = SKTextAlign.Left, bool grey = false)
    {
        using var font = Font(sizeMm);
        if (TextWindow is { } win)
        {
            var w = font.MeasureText(s);
            var left = align switch { SKTextAlign.Center => x - w / 2, SKTextAlign.Right => x - w, _ => x };
            if (left < win.Left || left + w > win.Right || y - sizeMm < win.Top || y + 0.3 * sizeMm > win.Bottom) return;
        }
        _text.Color = grey ? new SKColor(90, 90, 90) : SKColors.Black;
        Canvas.DrawText(s, (float)x, (float)y, align, font, _text);
    }

    /// <summary>An arrowhead at (x, y) pointing along angle (radians, page coordinates).</summary>
    public void Arrow(double x, double y, double angle, double size = 1.6)
    {
        using var p = new SKPath();
        p.MoveTo((float)x, (float)y);
        p.LineTo((float)(x - size * Math.Cos(angle - 0.4)), (float)(y - size * Math.Sin(angle - 0.4)));
        p.LineTo((float)(x - size * Math.Cos(angle + 0.4)), (float)(y - size * Math.Sin(angle + 0.4)));
        p.Close();
        FillPath(p, SKColors.Black);
    }

    public void Dispose()
    {
        _stroke.Dispose();
        _fill.Dispose();
        _text.Dispose();
    }
}
