using System.Globalization;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;
using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>One plain line on what a site sees.</summary>
internal static class LocalSummary
{
    public static string Describe(LocalCircumstances local, TimeScaleConverter time)
    {
        var e = local.Eclipse;
        var kind = e.Kind.ToString().ToLowerInvariant();
        if (!local.AnyVisible)
        {
            return local.HorizonState == MoonHorizonState.DownThroughout
                ? $"Not visible: the Moon stays below the horizon throughout this {kind} eclipse."
                : $"Not visible: the Moon is below the horizon{(local.Site.Horizon.IsFlat ? "" : " or the local horizon profile")} for the whole of this {kind} eclipse.";
        }
        var whole = local.VisiblePhases.Where(p => p.Phase == EclipsePhase.Penumbral).ToList();
        var p1 = e.Contact(ContactName.P1)!;
        var p4 = e.Contact(ContactName.P4)!;
        var sentences = new List<string>();
        if (whole.Count == 1 && whole[0].StartTt == p1.Tt && whole[0].EndTt == p4.Tt)
        {
            sentences.Add($"The whole {kind} eclipse is visible");
        }
        else
        {
            var first = whole[0];
            var last = whole[^1];
            var parts = new List<string>();
            if (first.StartTt > p1.Tt) parts.Add($"the Moon comes into view at {Local(first.StartUtc, local)} during the {PhaseAt(e, first.StartTt)}");
            if (last.EndTt < p4.Tt) parts.Add($"it is lost from view at {Local(last.EndUtc, local)} during the {PhaseAt(e, last.EndTt)}");
            sentences.Add($"Part of the {kind} eclipse is visible: " + string.Join(", and ", parts));
        }
        var total = local.VisibleMinutes(EclipsePhase.Total);
        if (e.Kind == EclipseKind.Total)
        {
            sentences[^1] += total > 0
                ? string.Create(CultureInfo.InvariantCulture, $"; {total:0} of {e.Durations.TotalMinutes:0} minutes of totality can be seen")
                : "; totality itself is not visible";
        }
        if (local.MaxVisibleUmbralMagnitude is { } best && best.Value > 0)
        {
            sentences[^1] += string.Create(CultureInfo.InvariantCulture,
                $", deepest at {Local(best.Utc, local)} (umbral magnitude {best.Value:0.00}, {(best.Altitude.Degrees < 1 ? "Moon on the horizon" : $"Moon {best.Altitude.Degrees:0}° high")})");
        }
        return sentences[^1] + ".";
    }

    private static string PhaseAt(LunarEclipse e, TtInstant tt)
    {
        bool Within(ContactName a, ContactName b) => e.Contact(a) is { } ca && e.Contact(b) is { } cb && ca.Tt <= tt && tt <= cb.Tt;
        return Within(ContactName.U2, ContactName.U3) ? "total phase" : Within(ContactName.U1, ContactName.U4) ? "partial phase" : "penumbral phase";
    }

    private static string Local(Instant utc, LocalCircumstances local)
    {
        var zoned = utc.InZone(local.Site.TimeZone);
        return zoned.ToString("HH:mm", CultureInfo.InvariantCulture) + (local.Site.TimeZone == DateTimeZone.Utc ? " UTC" : " local time");
    }
}
