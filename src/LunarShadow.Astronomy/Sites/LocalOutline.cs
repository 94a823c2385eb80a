using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>How much of an eclipse a site sees.</summary>
public enum SiteVisibility
{
    /// <summary>Nothing: the Moon stays below the sea horizon all through the 24 hours about greatest eclipse.</summary>
    NoneMoonDownThroughout,

    /// <summary>Nothing: the Moon is below the horizon (or the profile, or the minimum altitude) for the whole eclipse.</summary>
    NoneBelowHorizon,

    /// <summary>The whole eclipse, P1 to P4.</summary>
    Whole,

    /// <summary>Part of it: the Moon comes into view, is lost from view, or both, during the eclipse.</summary>
    Part,
}

/// <summary>The Moon comes into view, or is lost from view, during the eclipse.</summary>
/// <param name="Utc">When.</param>
/// <param name="Stage">The innermost phase in progress then (penumbral, partial or total).</param>
public sealed record ViewChange(Instant Utc, EclipsePhase Stage);

/// <summary>
/// What a site sees of an eclipse, as codes and numbers: the facts a one-line summary is written from. Words are the
/// caller's business.
/// </summary>
/// <param name="Visibility">How much is seen.</param>
/// <param name="ComesIntoView">When the Moon comes into view after P1, if it does.</param>
/// <param name="LostFromView">When it is lost from view before P4, if it is.</param>
/// <param name="MissedPhases">Phases of this eclipse of which nothing is seen (the penumbral phase is P1–P4, the
/// partial or umbral phase U1–U4, the total phase U2–U3).</param>
/// <param name="VisibleTotalityMinutes">Minutes of totality seen.</param>
/// <param name="TotalityMinutes">Minutes of totality in all (0 for a partial or penumbral eclipse).</param>
/// <param name="Night">The local night that holds the visible part (or greatest eclipse when nothing is seen).</param>
public sealed record LocalOutline(
    SiteVisibility Visibility,
    ViewChange? ComesIntoView,
    ViewChange? LostFromView,
    IReadOnlyList<EclipsePhase> MissedPhases,
    double VisibleTotalityMinutes,
    double TotalityMinutes,
    LocalNight Night)
{
    /// <summary>The outline of a site's circumstances.</summary>
    public static LocalOutline Of(LocalCircumstances local)
    {
        var greatestUtc = local.Contacts.First(c => c.Name is null).Utc;
        var e = local.Eclipse;
        var whole = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        var phases = new List<EclipsePhase> { EclipsePhase.Penumbral };
        if (e.Kind is EclipseKind.Partial or EclipseKind.Total) phases.Add(EclipsePhase.Partial);
        if (e.Kind == EclipseKind.Total) phases.Add(EclipsePhase.Total);
        var missed = phases.Where(p => local.VisibleMinutes(p) <= 0).ToList();
        var totality = e.Kind == EclipseKind.Total ? e.Durations.TotalMinutes ?? 0 : 0;
        var night = LocalNight.Around(
            whole.Count == 0 ? greatestUtc : whole[0].StartUtc + (whole[^1].EndUtc - whole[0].StartUtc) / 2, local.Site.TimeZone);
        if (whole.Count == 0)
        {
            return new LocalOutline(local.HorizonState == MoonHorizonState.DownThroughout ? SiteVisibility.NoneMoonDownThroughout : SiteVisibility.NoneBelowHorizon,
                null, null, missed, 0, totality, night);
        }
        var p1 = e.Contact(ContactName.P1)!;
        var p4 = e.Contact(ContactName.P4)!;
        var first = whole[0];
        var last = whole[^1];
        var comes = first.StartTt > p1.Tt ? new ViewChange(first.StartUtc, StageAt(e, first.StartTt)) : null;
        var lost = last.EndTt < p4.Tt ? new ViewChange(last.EndUtc, StageAt(e, last.EndTt)) : null;
        var visibility = comes is null && lost is null && whole.Count == 1 ? SiteVisibility.Whole : SiteVisibility.Part;
        return new LocalOutline(visibility, comes, lost, missed, local.VisibleMinutes(EclipsePhase.Total), totality, night);
    }

    // Between P1 and P4 (as comes and lost are) some phase is always in progress.
    private static EclipsePhase StageAt(LunarEclipse e, TtInstant tt) => EclipsePhases.At(e, tt) ?? EclipsePhase.Penumbral;
}
