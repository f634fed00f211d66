namespace Helipol.Engine;

/// <summary>A point or direction in space, in metres when it is a position.</summary>
public readonly record struct Vector3(double X, double Y, double Z)
{
    public static Vector3 operator +(Vector3 a, Vector3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);
    public static Vector3 operator -(Vector3 a, Vector3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);
    public static Vector3 operator -(Vector3 a) => new(-a.X, -a.Y, -a.Z);
    public static Vector3 operator *(double s, Vector3 a) => new(s * a.X, s * a.Y, s * a.Z);
    public static Vector3 operator *(Vector3 a, double s) => new(s * a.X, s * a.Y, s * a.Z);

    public static double Dot(Vector3 a, Vector3 b) => a.X * b.X + a.Y * b.Y + a.Z * b.Z;

    public static Vector3 Cross(Vector3 a, Vector3 b) =>
        new(a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);

    public double Length => Math.Sqrt(X * X + Y * Y + Z * Z);

    public double LengthSquared => X * X + Y * Y + Z * Z;

    public static double Distance(Vector3 a, Vector3 b) => (a - b).Length;

    /// <summary>Mirror image in the plane z = 0 (image theory for a perfect ground).</summary>
    public Vector3 MirroredInGround => new(X, Y, -Z);

    public bool IsFinite => double.IsFinite(X) && double.IsFinite(Y) && double.IsFinite(Z);

    public override string ToString() =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"({X:G6}, {Y:G6}, {Z:G6}) m");
}
