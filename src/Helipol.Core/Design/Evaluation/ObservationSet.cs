namespace Helipol.Design;

/// <summary>One far-field direction: elevation above the horizon and azimuth, radians.</summary>
public readonly record struct Direction(double ElevationRad, double AzimuthRad)
{
    /// <summary>Polar angle θ from +z, as the engine takes it.</summary>
    public double ThetaRad => Math.PI / 2 - ElevationRad;
}

/// <summary>The far-field directions a design is judged over.</summary>
public sealed class ObservationSet
{
    private ObservationSet(Direction[] directions) => Directions = directions;

    public IReadOnlyList<Direction> Directions { get; }

    /// <summary>
    /// Elevations from <paramref name="fromRad"/> to <paramref name="toRad"/> (both included, about
    /// <paramref name="elevationStepRad"/> apart) × azimuths 0, step, 2·step … below
    /// <paramref name="azimuthSpanRad"/> (2π for a full turn; 2π/N suffices for N identical,
    /// evenly spaced elements, whose pattern repeats every 2π/N).
    /// </summary>
    public static ObservationSet Window(double fromRad, double toRad, double elevationStepRad, double azimuthStepRad, double azimuthSpanRad = 2 * Math.PI)
    {
        int rows = elevationStepRad > 0 ? Math.Max(1, (int)Math.Round((toRad - fromRad) / elevationStepRad)) : 1;
        var elevations = rows == 1 && toRad - fromRad < 1e-12
            ? new[] { fromRad }
            : Enumerable.Range(0, rows + 1).Select(i => fromRad + (toRad - fromRad) * i / rows).ToArray();
        int columns = Math.Max(1, (int)Math.Ceiling(azimuthSpanRad / azimuthStepRad - 1e-9));
        var list = new List<Direction>(elevations.Length * columns);
        foreach (var el in elevations)
            for (int j = 0; j < columns; j++) list.Add(new Direction(el, j * azimuthStepRad));
        return new ObservationSet(list.ToArray());
    }

    /// <summary>A cone at one elevation, the full turn of azimuth.</summary>
    public static ObservationSet Cone(double elevationRad, double azimuthStepRad) =>
        Window(elevationRad, elevationRad, 0, azimuthStepRad);

    /// <summary>Arbitrary directions.</summary>
    public static ObservationSet Of(IEnumerable<Direction> directions) => new(directions.ToArray());
}
