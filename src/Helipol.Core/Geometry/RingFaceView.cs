namespace Helipol.Geometry;

/// <summary>Which face of a ring a drawing shows. The bottom face is drawn as seen from below,
/// i.e. mirrored left-right, so it can be laid on the paper face down.</summary>
public enum RingFace { Top, Bottom }

/// <summary>What a face mark stands for: the wire crossing the face, or an element's end inside the
/// ring, drawn on the face beyond that end.</summary>
public enum FaceMarkKind { Crossing, End }

/// <summary>A mark on a ring face, in the view's own coordinates (origin at the ring's centre, mm):
/// where an element's wire crosses that face, or where an element ends inside the ring, with
/// <see cref="DepthMm"/> the end's distance into the ring from this face (0 for a crossing).</summary>
public sealed record FaceMark(int ElementNumber, double AzimuthRad, Point2 OnContour, Point2 Inner, Point2 LabelAt,
    FaceMarkKind Kind, double DepthMm);

/// <summary>
/// One face of one foam ring as drawn at 1:1: kerf-compensated cut contours (outer grown by kerf/2,
/// bore shrunk by kerf/2), an orientation notch at azimuth 0 and the element marks. Coordinates
/// are local to the ring's centre; <see cref="Centre"/> places the view on a board or sheet.
/// </summary>
public sealed record RingFaceView(
    int RingNumber, RingFace Face, Point2 Centre, double FaceHeightMm,
    double OuterRadiusMm, double BoreRadiusMm, double CutOuterRadiusMm, double CutBoreRadiusMm,
    OrientationNotch Notch, IReadOnlyList<FaceMark> Marks)
{
    /// <summary>Maps an azimuth on the part to an angle in this drawing: the bottom face is mirrored.</summary>
    public static double DrawingAngle(RingFace face, double azimuthRad) => face == RingFace.Top ? azimuthRad : Math.PI - azimuthRad;

    public double HalfSizeMm => CutOuterRadiusMm + RingTemplates.LabelMarginMm;
}

/// <summary>A V notch cut into the outer contour at the part's azimuth 0: the two points where the
/// notch leaves the circle, and its tip, in view coordinates.</summary>
public sealed record OrientationNotch(Point2 Left, Point2 Tip, Point2 Right, double HalfAngleRad, double DrawingAngleRad);
