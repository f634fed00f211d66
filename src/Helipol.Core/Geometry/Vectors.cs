namespace Helipol.Geometry;

/// <summary>A point or direction in a drawing plane, mm.</summary>
public readonly record struct Point2(double X, double Y)
{
    public static Point2 operator +(Point2 a, Point2 b) => new(a.X + b.X, a.Y + b.Y);
    public static Point2 operator -(Point2 a, Point2 b) => new(a.X - b.X, a.Y - b.Y);
    public static Point2 operator *(double k, Point2 a) => new(k * a.X, k * a.Y);
    public static Point2 Polar(double radius, double angleRad) => new(radius * Math.Cos(angleRad), radius * Math.Sin(angleRad));
    public double Length => Math.Sqrt(X * X + Y * Y);
}

/// <summary>A point in space, mm; z along the whip, up.</summary>
public readonly record struct Point3(double X, double Y, double Z)
{
    public static Point3 operator +(Point3 a, Point3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);
    public static Point3 operator -(Point3 a, Point3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);
    public static Point3 Cross(Point3 a, Point3 b) => new(a.Y * b.Z - a.Z * b.Y, a.Z * b.X - a.X * b.Z, a.X * b.Y - a.Y * b.X);
    public static double Dot(Point3 a, Point3 b) => a.X * b.X + a.Y * b.Y + a.Z * b.Z;
    public double Length => Math.Sqrt(X * X + Y * Y + Z * Z);
    public static Point3 Cylindrical(double radius, double azimuthRad, double z) =>
        new(radius * Math.Cos(azimuthRad), radius * Math.Sin(azimuthRad), z);
}
