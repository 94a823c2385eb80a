namespace LunarShadow.Astronomy.Eclipses;

/// <summary>An eclipse's place in its Saros series.</summary>
/// <param name="Series">The Saros series number (van den Bergh's numbering, as the canons use).</param>
/// <param name="Member">The eclipse's index in its series, 1 for the first eclipse of the series.</param>
public sealed record SarosMember(int Series, int Member);
