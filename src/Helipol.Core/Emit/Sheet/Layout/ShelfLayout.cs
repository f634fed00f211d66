namespace Helipol.Emit.Sheet.Layout;

/// <summary>A drawing to place: its full size in mm and how to draw it with its top-left corner at the origin.</summary>
internal sealed record Drawing(double WidthMm, double HeightMm, Action<SheetPen> Draw, string Name = "");

/// <summary>Where a drawing (or one tile of it) lands: page index, top-left corner on the page, and
/// the tile it shows.</summary>
internal sealed record Placement(int Page, double Left, double Top, Tile Tile, Drawing Drawing);

/// <summary>
/// Places drawings on pages in shelves: left to right while they fit the width, a new shelf under
/// the tallest of the last, a new page when a shelf would cross the bottom. Every placement lies
/// inside the content box and no two boxes overlap (each keeps a gap to the next). A drawing larger
/// than the content box is cut into tiles (<see cref="Tiling"/>), each placed like a drawing of its own.
/// </summary>
internal static class ShelfLayout
{
    public const double GapMm = 4;

    public static IReadOnlyList<Placement> Place(IEnumerable<Drawing> drawings, double left, double top, double right, double bottom)
    {
        var width = right - left;
        var height = bottom - top;
        var placements = new List<Placement>();
        int page = 0;
        double x = left, y = top, shelf = 0;
        foreach (var d in drawings)
            foreach (var tile in Tiling.Cut(d.WidthMm, d.HeightMm, width, height))
            {
                if (x > left && x + tile.W > right) { x = left; y += shelf + GapMm; shelf = 0; }
                if (y > top && y + tile.H > bottom) { page++; x = left; y = top; shelf = 0; }
                placements.Add(new Placement(page, x, y, tile, d));
                x += tile.W + GapMm;
                shelf = Math.Max(shelf, tile.H);
                // A tile of a drawing cut in tiles takes the whole page.
                if (tile.Count > 1) { page++; x = left; y = top; shelf = 0; }
            }
        return placements;
    }
}
