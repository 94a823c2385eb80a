using LunarShadow.Api.Common;

namespace LunarShadow.Api.Sites;

/// <summary>The next eclipses a site can see.</summary>
/// <param name="Site">The site (echo).</param>
/// <param name="Criteria">What was asked.</param>
/// <param name="Count">Number of eclipses found.</param>
/// <param name="Eclipses">The eclipses, in time order.</param>
/// <param name="Note">Why fewer were found than asked for, if so.</param>
/// <param name="SearchedUntil">The UTC date the search stopped before: the year limit, or the end of the supported range.</param>
/// <param name="SearchLimitReached">
/// True when fewer eclipses than asked for were found because the search stopped at its year limit: later eclipses may
/// still qualify (ask for more years). False when count was reached or the search ran to the end of the supported range.
/// </param>
public sealed record UpcomingResponse(SiteEcho Site, UpcomingCriteriaEcho Criteria, int Count, IReadOnlyList<UpcomingItem> Eclipses, string? Note,
    string SearchedUntil, bool SearchLimitReached);

/// <summary>The criteria as understood.</summary>
/// <param name="From">First date searched.</param>
/// <param name="Count">Number asked for.</param>
/// <param name="Phase">Least phase that must be visible: penumbral, partial (includes total) or total.</param>
/// <param name="AstronomicalNightOnly">Only the part with the Sun 18° or more below the horizon counts.</param>
/// <param name="MinAltitudeDegrees">Least altitude of the Moon's upper limb that counts, degrees.</param>
/// <param name="Open">Opening hours that count, if given.</param>
/// <param name="ShadowModel">Shadow model used.</param>
/// <param name="Years">How many years from From were searched at most.</param>
public sealed record UpcomingCriteriaEcho(string From, int Count, string Phase, bool AstronomicalNightOnly, double MinAltitudeDegrees, string? Open, string ShadowModel,
    int Years);

/// <summary>One eclipse the site can see.</summary>
/// <param name="Date">UTC date of greatest eclipse (the eclipse's id).</param>
/// <param name="Kind">penumbral, partial or total.</param>
/// <param name="Night">The local dates of the night that holds the visible part.</param>
/// <param name="GreatestEclipseUtc">Greatest eclipse, UTC.</param>
/// <param name="GreatestEclipseLocal">Greatest eclipse, local time.</param>
/// <param name="QualifyingMinutes">Minutes of the chosen phase that meet every criterion.</param>
/// <param name="Qualifying">Those stretches.</param>
/// <param name="GreatestVisibleUmbralMagnitude">Greatest umbral magnitude seen.</param>
/// <param name="Summary">What the site sees, in one line.</param>
public sealed record UpcomingItem(
    string Date, string Kind, NightResponse Night, string GreatestEclipseUtc, string GreatestEclipseLocal, double QualifyingMinutes,
    IReadOnlyList<VisiblePhaseResponse> Qualifying, VisibleMagnitudeResponse? GreatestVisibleUmbralMagnitude, string Summary)
{
    /// <summary>Deprecated: the former name of <see cref="GreatestVisibleUmbralMagnitude"/>, written for one more release.</summary>
    public VisibleMagnitudeResponse? MaxVisibleUmbralMagnitude => GreatestVisibleUmbralMagnitude;
}
