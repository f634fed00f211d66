namespace Helipol.Engine.Mesh;

/// <summary>
/// Half of a triangle (rooftop) basis function lying on one segment. Its current is
/// Sign · (segment direction) · shape(u), with shape u when <see cref="Rising"/> (1 at the segment's end)
/// and 1 − u otherwise (1 at its start). A basis is one piece (a wire end on a perfect ground, whose other
/// half is the image) or two pieces meeting at a node, possibly across a bend or a junction.
/// </summary>
internal readonly record struct BasisPiece(int Basis, int Segment, double Sign, bool Rising)
{
    /// <summary>d(shape)/du: +1 rising, −1 falling. Times Sign / L it is the current's divergence.</summary>
    public double Slope => Rising ? 1.0 : -1.0;
}
