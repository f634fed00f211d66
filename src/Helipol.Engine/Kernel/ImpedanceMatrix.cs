using System.Numerics;
using Helipol.Engine.Mesh;

namespace Helipol.Engine.Kernel;

/// <summary>
/// Fills the Galerkin impedance matrix of the electric-field integral equation for triangle bases
/// (Harrington, *Field Computation by Moment Methods*, §4; Gibson, *The Method of Moments in
/// Electromagnetics*, thin-wire EFIE in mixed-potential form):
///   Z_mn = jωμ0 ∬ f_m·f_n G + (1/(jωε0)) ∬ (∇·f_m)(∇·f_n) G,  G = e^{−jkR}/(4πR),
/// plus the wires' series impedance ∫ Z' f_m·f_n dl and lumped loads on the diagonal. With a perfect
/// ground every source term gains its image (horizontal current and charge reversed, vertical current
/// kept), which is the same as the image with its current reversed along the mirrored segment.
/// Layout: column-major N×N, entry (m, n) at m + n·N.
/// </summary>
internal static class ImpedanceMatrix
{
    public static void Fill(MeshedModel mesh, InteractionTable table, bool mirrored, double k, Complex[] z)
    {
        int n = mesh.UnknownCount;
        Array.Clear(z, 0, n * n);
        var segs = mesh.Segments;
        var start = mesh.PieceStart;
        var pieces = mesh.PiecesBySegment;
        double eta = PhysicalConstants.Eta0;
        // jη/(4π) is common to both the vector- and the scalar-potential terms.
        double c = eta / (4 * Math.PI);
        for (int e = 0; e < table.PairCount; e++)
        {
            int p = table.P[e], q = table.Q[e];
            table.Moments(e, k, out var i00, out var i10, out var i01, out var i11);
            double sign = table.Image[e] ? -1.0 : 1.0;
            double vec = k * segs[p].LengthM * segs[q].LengthM * table.TangentDot[e];
            double sca = 1.0 / k;
            bool both = mirrored && p != q;
            for (int ia = start[p]; ia < start[p + 1]; ia++)
            {
                var a = pieces[ia];
                for (int ib = start[q]; ib < start[q + 1]; ib++)
                {
                    var b = pieces[ib];
                    Complex phi = a.Rising
                        ? (b.Rising ? i11 : i10 - i11)
                        : (b.Rising ? i01 - i11 : i00 - i10 - i01 + i11);
                    Complex bracket = vec * phi - (a.Slope * b.Slope * sca) * i00;
                    double scale = sign * a.Sign * b.Sign * c;
                    // Multiply by j·scale: (x + jy)·j = −y + jx.
                    var val = new Complex(-scale * bracket.Imaginary, scale * bracket.Real);
                    z[a.Basis + b.Basis * n] += val;
                    if (both) z[b.Basis + a.Basis * n] += val;
                }
            }
        }
        AddWireImpedance(mesh, k * PhysicalConstants.SpeedOfLight, z);
        for (int i = 0; i < mesh.LoadBases.Length; i++)
            z[mesh.LoadBases[i] * (n + 1)] += mesh.LoadImpedances[i];
    }

    /// <summary>∫ Z' f_m·f_n dl: on one segment ∫₀¹u² = ∫₀¹(1−u)² = 1/3 and ∫₀¹u(1−u) = 1/6.</summary>
    private static void AddWireImpedance(MeshedModel mesh, double omega, Complex[] z)
    {
        int n = mesh.UnknownCount;
        var segs = mesh.Segments;
        for (int s = 0; s < segs.Length; s++)
        {
            if (segs[s].Impedance.IsZero) continue;
            Complex perSegment = segs[s].Impedance.PerMetreOhm(omega) * segs[s].LengthM;
            for (int ia = mesh.PieceStart[s]; ia < mesh.PieceStart[s + 1]; ia++)
                for (int ib = mesh.PieceStart[s]; ib < mesh.PieceStart[s + 1]; ib++)
                {
                    var a = mesh.PiecesBySegment[ia];
                    var b = mesh.PiecesBySegment[ib];
                    double overlap = a.Rising == b.Rising ? 1.0 / 3 : 1.0 / 6;
                    z[a.Basis + b.Basis * n] += a.Sign * b.Sign * overlap * perSegment;
                }
        }
    }
}
