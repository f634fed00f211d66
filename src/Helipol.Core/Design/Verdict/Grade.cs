namespace Helipol.Design;

/// <summary>
/// What a builder can expect from a design. <c>works</c>: circular in the wanted sense over the band
/// and coverage window, better than the bare whip, matched, repeatable. <c>marginal</c>: it converts,
/// but some figure is short of the mark (an axial ratio a little over the limit, a small gain over the
/// bare whip, a high VSWR, a low yield). <c>fails</c>: it will not give circular polarization of the
/// wanted sense where it is needed, or it does no better than the bare whip.
/// </summary>
public enum Grade { Works, Marginal, Fails }

public static class GradeWords
{
    public static string Word(this Grade g) => g switch { Grade.Works => "works", Grade.Marginal => "marginal", _ => "fails" };
}
