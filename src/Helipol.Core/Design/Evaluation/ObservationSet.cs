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

    /// <summary>
    /// A coverage window: elevations as in <see cref="Window"/>; azimuths over <paramref name="coverageSpanRad"/>
    /// centred on azimuth 0, both ends included (a full turn when the span is 2π). With N identical,
    /// evenly spaced elements a period of 2π/N covers every azimuth (<paramref name="periodRad"/>), so a
    /// span at least that wide is sampled over one period only.
    /// </summary>
    public static ObservationSet Coverage(double fromRad, double toRad, double elevationStepRad, double azimuthStepRad, double coverageSpanRad, double periodRad = 2 * Math.PI)
    {
        if (coverageSpanRad >= Math.Min(periodRad, 2 * Math.PI) - 1e-12)
            return Window(fromRad, toRad, elevationStepRad, azimuthStepRad, Math.Min(periodRad, 2 * Math.PI));
        var rows = Window(fromRad, toRad, elevationStepRad, azimuthStepRad, azimuthStepRad).Directions.Select(d => d.ElevationRad).ToArray();
        int steps = Math.Max(1, (int)Math.Ceiling(coverageSpanRad / azimuthStepRad - 1e-9));
        var list = new List<Direction>();
        foreach (var el in rows)
            for (int j = 0; j <= steps; j++) list.Add(new Direction(el, -coverageSpanRad / 2 + coverageSpanRad * j / steps));
        return new ObservationSet(list.ToArray());
    }

    /// <summary>A cone at one elevation, the full turn of azimuth.</summary>
    public static ObservationSet Cone(double elevationRad, double azimuthStepRad) =>
        Window(elevationRad, elevationRad, 0, azimuthStepRad);

    /// <summary>Arbitrary directions.</summary>
    public static ObservationSet Of(IEnumerable<Direction> directions) => new(directions.ToArray());
}
