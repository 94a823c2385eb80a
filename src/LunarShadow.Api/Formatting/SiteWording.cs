using System.Globalization;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Sites;
using NodaTime;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// Every sentence the API writes about a site: summaries, public-night notes, local-time notes, cautions and the
/// descriptions in calendar files. The library hands over codes and numbers; this is the one place they become English,
/// so that it can later be localised.
/// </summary>
internal static class SiteWording
{
    private static readonly string[] Months =
        ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

    /// <summary>Hint shown when no time zone was given.</summary>
    public const string UtcHint = "No time zone given: local times are in UTC. Pass tz=Area/City (IANA), e.g. tz=Europe/Vienna.";

    /// <summary>How to read brightness and exposure in the photo plan.</summary>
    public const string BrightnessModelNote = "Brightness is computed from the shadow geometry and the uneclipsed Moon; inside the umbra it is an estimate from the expected Danjon L, good to about ±1.5 stops. Bracket, and check the histogram.";

    /// <summary>"the night of Sunday 31 December 2028 to Monday 1 January 2029 (JST)".</summary>
    public static string Night(LocalNight night, DateTimeZone zone)
    {
        var evening = LocalDates.InAstronomersCalendar(night.Evening);
        var morning = LocalDates.InAstronomersCalendar(night.Morning);
        var first = evening.Year == morning.Year ? DayMonth(evening) : DayMonthYear(evening);
        return $"the night of {first} to {DayMonthYear(morning)} ({string.Join("/", LocalDates.Abbreviations(night, zone))})";
    }

    /// <summary>
    /// A local clock reading with its zone, e.g. "01:52 JST"; where the reading occurs twice that night (clocks go back),
    /// it says which one is meant.
    /// </summary>
    public static string Clock(Instant instant, DateTimeZone zone)
    {
        var text = instant.InZone(zone).ToString("HH:mm", CultureInfo.InvariantCulture) + " " + LocalDates.Abbreviation(instant, zone);
        return Repeated(instant, zone) is { } which
            ? text + $" ({LocalDates.UtcOffset(instant, zone)}, the {which} of the two {instant.InZone(zone):HH:mm}s as clocks go back)"
            : text;
    }

    /// <summary>A note for a local date-time that occurs twice (clocks go back), or null.</summary>
    public static string? RepeatedTimeNote(Instant instant, DateTimeZone zone) =>
        Repeated(instant, zone) is { } which
            ? $"This local time occurs twice (clocks go back); the {which} one, at {LocalDates.UtcOffset(instant, zone)}, is meant."
            : null;

    /// <summary>The one-line summary of what a site sees.</summary>
    public static string Summary(LocalCircumstances local)
    {
        var o = local.Outline;
        var zone = local.Site.TimeZone;
        var kind = KindName(local.Eclipse.Kind);
        var night = Night(o.Night, zone);
        var below = Below(local.Site);
        switch (o.Visibility)
        {
            case SiteVisibility.NoneMoonDownThroughout:
                return $"Not visible in {night}: the Moon stays below the horizon throughout this {kind} eclipse.";
            case SiteVisibility.NoneBelowHorizon:
                return $"Not visible in {night}: the whole {kind} eclipse happens while the Moon is {below}.";
        }
        var text = o.Visibility == SiteVisibility.Whole
            ? $"In {night}, the whole {kind} eclipse is visible"
            : $"In {night}, part of the {kind} eclipse is visible: " + string.Join(", and ", new[]
            {
                o.ComesIntoView is { } c ? $"the Moon comes into view at {Clock(c.Utc, zone)} during the {StageName(c.Stage)}" : null,
                o.LostFromView is { } l ? $"it is lost from view at {Clock(l.Utc, zone)} during the {StageName(l.Stage)}" : null,
                o.ComesIntoView is null && o.LostFromView is null ? "the Moon dips behind the horizon profile during it" : null,
            }.Where(s => s is not null));
        if (o.MissedPhases.Contains(EclipsePhase.Partial))
            text += $"; the umbral phase{(local.Eclipse.Kind == EclipseKind.Total ? ", totality included," : "")} happens while the Moon is {below}";
        else if (o.MissedPhases.Contains(EclipsePhase.Total))
            text += $"; totality happens while the Moon is {below}";
        else if (local.Eclipse.Kind == EclipseKind.Total)
            text += string.Create(CultureInfo.InvariantCulture, $"; {o.VisibleTotalityMinutes:0} of {o.TotalityMinutes:0} minutes of totality can be seen");
        if (local.GreatestVisibleUmbralMagnitude is { } best && best.Value > 0)
        {
            text += string.Create(CultureInfo.InvariantCulture,
                $", deepest at {Clock(best.Utc, zone)} (umbral magnitude {best.Value:0.00}, {(best.Altitude.Degrees < 1 ? "Moon on the horizon" : $"Moon {best.Altitude.Degrees:0}° high")})");
        }
        return text + ".";
    }

    /// <summary>One plain line about a public-night plan.</summary>
    public static string PublicNightNote(PublicNightPlan plan, LocalCircumstances local)
    {
        var zone = local.Site.TimeZone;
        var note = plan.Outcome switch
        {
            PublicNightOutcome.NothingVisible => "Nothing of this eclipse is visible from here.",
            PublicNightOutcome.OutsideOpeningHours =>
                $"The eclipse is visible from here, but entirely outside the opening hours ({Clock(plan.Window.Opens, zone)} to {Clock(plan.Window.Closes, zone)}).",
            PublicNightOutcome.OnlyFaintPenumbra => "Only the faint penumbral phase falls within the opening hours; it is hard to notice by eye.",
            _ => $"Suggested session {Clock(plan.Session!.DoorsOpen, zone)} to {Clock(plan.Session.DoorsClose, zone)}, in {Night(local.Outline.Night, zone)}"
                + (plan.TotalityMinutesInWindow > 0
                    ? string.Create(CultureInfo.InvariantCulture, $", with {plan.TotalityMinutesInWindow:0} minutes of totality inside opening hours.")
                    : "."),
        };
        foreach (var (adjustment, what) in new[] { (plan.Window.OpensAdjustment, "opening"), (plan.Window.ClosesAdjustment, "closing") })
        {
            if (adjustment is null) continue;
            var asked = adjustment.Asked;
            var day = LocalDates.Iso(asked.Date);
            var used = what == "opening" ? plan.Window.Opens : plan.Window.Closes;
            note += " " + adjustment.Kind switch
            {
                ClockAdjustmentKind.SkippedTakenAsEndOfGap =>
                    $"The {what} time {asked:HH:mm} on {day} does not exist (clocks go forward); taken as {Clock(used, zone)}.",
                ClockAdjustmentKind.RepeatedFirstUsed =>
                    $"The {what} time {asked:HH:mm} on {day} occurs twice (clocks go back); the first, at {LocalDates.UtcOffset(used, zone)}, is used.",
                _ => $"The {what} time {asked:HH:mm} on {day} occurs twice (clocks go back); the second, at {LocalDates.UtcOffset(used, zone)}, is used.",
            };
        }
        return note;
    }

    // Common practice for eclipse outreach: warn about the Sun whenever it is up or just set (or about to rise) while
    // the eclipsed Moon is low on the opposite horizon, and about the dark for every visible night-time eclipse.
    /// <summary>Safety notes that apply to this night.</summary>
    public static List<string> Cautions(LocalCircumstances l)
    {
        var cautions = new List<string>();
        if (l.Contacts.Any(c => c.Visible && c.SunAltitude > SkyStates.CivilTwilightEndAltitude))
            cautions.Add("The Sun is up or only just below the horizon, opposite the Moon, during part of the visible eclipse: never point binoculars, telescopes or camera lenses near it, and keep optics capped while turning.");
        if (l.AnyVisible)
            cautions.Add("Observing at night: choose a site you can reach and leave safely in the dark, watch for traffic and uneven ground, dress for the cold, and follow local rules for access and lights.");
        return cautions;
    }

    /// <summary>The site's name, or its coordinates.</summary>
    public static string Where(Site site) =>
        site.Name ?? FormattableString.Invariant($"{site.Location.Latitude.Degrees:0.####}, {site.Location.Longitude.Degrees:0.####}");

    /// <summary>Name of the local calendar for one eclipse.</summary>
    public static string LocalCalendarName(string eclipseDate, Site site) => $"Lunar eclipse {eclipseDate} at {Where(site)}";

    /// <summary>Name of the subscription feed.</summary>
    public static string UpcomingCalendarName(Site site) => $"Lunar eclipses visible from {Where(site)}";

    /// <summary>Title of a visible-phase event.</summary>
    public static string PhaseEventTitle(EclipseKind kind, EclipsePhase phase) => $"Lunar eclipse ({KindName(kind)}): {PhaseName(phase)} phase visible";

    /// <summary>The description of a visible-phase event: its window, the phase's own times, and any clipping.</summary>
    public static string PhaseEventDescription(LocalCircumstances local, VisibleSpan span)
    {
        var zone = local.Site.TimeZone;
        var (startContact, endContact) = Contacts(span.Phase);
        var start = local.Contacts.FirstOrDefault(c => c.Label == startContact);
        var end = local.Contacts.FirstOrDefault(c => c.Label == endContact);
        var lines = new List<string>
        {
            $"The {PhaseName(span.Phase)} phase ({startContact}–{endContact}) of the {KindName(local.Eclipse.Kind)} lunar eclipse, seen from {Where(local.Site)}, in {Night(local.Outline.Night, zone)}.",
            string.Create(CultureInfo.InvariantCulture, $"This event is the part you can see: from {Clock(span.StartUtc, zone)} to {Clock(span.EndUtc, zone)} ({span.Minutes:0} minutes)."),
        };
        var startClipped = start is not null && span.StartUtc - start.Utc > Duration.FromSeconds(1);
        var endClipped = end is not null && end.Utc - span.EndUtc > Duration.FromSeconds(1);
        if (start is not null && end is not null)
        {
            lines.Add(startClipped || endClipped
                ? $"The phase itself runs from {Clock(start.Utc, zone)} ({startContact}) to {Clock(end.Utc, zone)} ({endContact}); this window is clipped: "
                    + string.Join(" and ", new[]
                    {
                        startClipped ? $"it starts {Why(local, span.StartUtc, rising: true)}" : null,
                        endClipped ? $"it ends {Why(local, span.EndUtc, rising: false)}" : null,
                    }.Where(s => s is not null)) + "."
                : $"That is the whole phase, {startContact} to {endContact}.");
        }
        lines.AddRange(Cautions(local));
        return string.Join("\n", lines);
    }

    /// <summary>Title of the public-session event.</summary>
    public static string SessionEventTitle(Site site) => $"Public lunar eclipse session at {Where(site)}";

    /// <summary>What the public will see during the suggested session, and when.</summary>
    public static string SessionEventDescription(LocalCircumstances local, PublicNightPlan plan)
    {
        var zone = local.Site.TimeZone;
        var s = plan.Session!;
        var lines = new List<string>
        {
            $"Public session for the {KindName(local.Eclipse.Kind)} lunar eclipse, in {Night(local.Outline.Night, zone)}: doors open {Clock(s.DoorsOpen, zone)}, close {Clock(s.DoorsClose, zone)}.",
            "What you will see:",
        };
        var moments = new List<(Instant At, string What)>();
        foreach (var e in local.MoonEvents.Where(e => e.Utc >= s.DoorsOpen && e.Utc <= s.DoorsClose))
            moments.Add((e.Utc, e.Type switch
            {
                MoonEventType.Rise => "the Moon rises",
                MoonEventType.Set => "the Moon sets",
                MoonEventType.ClearsHorizonProfile => "the Moon clears the skyline",
                _ => "the Moon goes behind the skyline",
            }));
        foreach (var c in local.Contacts.Where(c => c.Visible && c.Utc >= s.DoorsOpen && c.Utc <= s.DoorsClose))
            moments.Add((c.Utc, ContactMoment(c.Label)));
        var stage = EclipsePhases.At(local.Eclipse, local.Eclipse.GreatestEclipse.PlusSeconds((s.DoorsOpen - local.Contacts.First(c => c.Name is null).Utc).TotalSeconds))
            ?? EclipsePhase.Penumbral;
        if (moments.Count == 0 || moments.Min(m => m.At) > s.DoorsOpen)
            moments.Insert(0, (s.DoorsOpen, $"the eclipse is in its {StageName(stage)}"));
        lines.AddRange(moments.OrderBy(m => m.At).Select(m => $"- {Clock(m.At, zone)}: {m.What}"));
        foreach (var p in plan.PhasesInWindow.Where(p => p.Phase == EclipsePhase.Total))
            lines.Add(string.Create(CultureInfo.InvariantCulture, $"Totality inside opening hours: {Clock(p.StartUtc, zone)} to {Clock(p.EndUtc, zone)} ({p.Minutes:0} minutes)."));
        lines.Add(string.Create(CultureInfo.InvariantCulture,
            $"The Moon stands {TimeFormats.Round(s.MoonAltitudeAtOpen.Degrees, 1):0.#}° above the horizon when the doors open and {TimeFormats.Round(s.MoonAltitudeAtClose.Degrees, 1):0.#}° when they close."));
        lines.AddRange(Cautions(local));
        return string.Join("\n", lines);
    }

    /// <summary>Title of an eclipse in the subscription feed.</summary>
    public static string UpcomingEventTitle(EclipseKind kind) => $"Lunar eclipse ({KindName(kind)}) visible";

    /// <summary>The description of an eclipse in the feed: the window that meets the criteria, then the whole picture.</summary>
    public static string UpcomingEventDescription(LocalCircumstances local, IReadOnlyList<VisibleSpan> qualifying, string criteria)
    {
        var zone = local.Site.TimeZone;
        var lines = new List<string>
        {
            $"This event covers only what meets your criteria ({criteria}):",
        };
        lines.AddRange(qualifying.Select(q => string.Create(CultureInfo.InvariantCulture,
            $"- {PhaseName(q.Phase)} phase from {Clock(q.StartUtc, zone)} to {Clock(q.EndUtc, zone)} ({q.Minutes:0} minutes)")));
        lines.Add("The whole eclipse as seen from here: " + Summary(local));
        return string.Join("\n", lines);
    }

    /// <summary>The criteria of an upcoming search in words, e.g. "partial phase or more, Moon at least 5° up, within 19:00-23:30".</summary>
    public static string Criteria(string phase, double minAltitudeDegrees, bool astronomicalNightOnly, string? open)
    {
        var parts = new List<string>
        {
            phase == "penumbral" ? "any phase" : phase == "partial" ? "partial phase or more" : "total phase",
            string.Create(CultureInfo.InvariantCulture, $"Moon at least {minAltitudeDegrees:0.#}° up"),
        };
        if (astronomicalNightOnly) parts.Add("in astronomical night");
        if (open is not null) parts.Add($"within the opening hours {open}");
        return string.Join(", ", parts);
    }

    /// <summary>Title of a photo-plan event.</summary>
    public static string PhotoEventTitle(string stage) => $"Photograph the lunar eclipse: {stage} phase";

    /// <summary>The exposure plan for one stretch of the photo plan.</summary>
    public static string PhotoEventDescription(DateTimeZone zone, string stage, Instant start, Instant end, (double Min, double Max) shutter,
        (double Min, double Max) iso, (double Min, double Max) aperture, int bracketStops, (double Min, double Max) bracket, (double Min, double Max) altitude)
    {
        var lines = new List<string>
        {
            $"{Capital(stage)} phase, {Clock(start, zone)} to {Clock(end, zone)}.",
            $"Exposure plan: shutter {Range(shutter, Shutter)}, ISO {Range(iso, v => v.ToString("0", CultureInfo.InvariantCulture))}, "
                + $"aperture {Range(aperture, v => "f/" + v.ToString("0.#", CultureInfo.InvariantCulture))}"
                + (bracketStops > 0 ? $"; bracket ±{bracketStops} stops ({Range(bracket, Shutter)})." : "; no bracket."),
            string.Create(CultureInfo.InvariantCulture, $"The Moon stands {altitude.Min:0}° to {altitude.Max:0}° above the horizon."),
            BrightnessModelNote,
        };
        return string.Join("\n", lines);
    }

    /// <summary>penumbral, partial or total.</summary>
    public static string KindName(EclipseKind kind) => kind switch
    {
        EclipseKind.Total => "total",
        EclipseKind.Partial => "partial",
        _ => "penumbral",
    };

    /// <summary>penumbral, partial or total.</summary>
    public static string PhaseName(EclipsePhase phase) => phase switch
    {
        EclipsePhase.Total => "total",
        EclipsePhase.Partial => "partial",
        _ => "penumbral",
    };

    /// <summary>A shutter time, e.g. 1/500 s or 2.5 s.</summary>
    public static string Shutter(double seconds) => seconds >= 0.5 || seconds <= 0
        ? seconds.ToString("0.##", CultureInfo.InvariantCulture) + " s"
        : "1/" + Math.Round(1 / seconds).ToString("0", CultureInfo.InvariantCulture) + " s";

    private static string Range((double Min, double Max) range, Func<double, string> format) =>
        format(range.Min) == format(range.Max) ? format(range.Min) : $"{format(range.Min)} to {format(range.Max)}";

    private static string Capital(string text) => text.Length == 0 ? text : char.ToUpperInvariant(text[0]) + text[1..];

    private static string StageName(EclipsePhase stage) => PhaseName(stage) + " phase";

    private static (string Start, string End) Contacts(EclipsePhase phase) => phase switch
    {
        EclipsePhase.Total => ("U2", "U3"),
        EclipsePhase.Partial => ("U1", "U4"),
        _ => ("P1", "P4"),
    };

    private static string ContactMoment(string label) => label switch
    {
        "P1" => "the Moon enters the faint outer shadow (P1); hard to notice at first",
        "U1" => "the Earth's dark shadow starts to cover the Moon (U1)",
        "U2" => "totality begins: the whole Moon is in the shadow, dim and reddish (U2)",
        "greatest" => "greatest eclipse",
        "U3" => "totality ends (U3)",
        "U4" => "the dark shadow leaves the Moon (U4)",
        _ => "the Moon leaves the outer shadow; the eclipse is over (P4)",
    };

    private static string Why(LocalCircumstances local, Instant at, bool rising)
    {
        var e = local.MoonEvents.FirstOrDefault(m => Math.Abs((m.Utc - at).TotalSeconds) < 1);
        return e?.Type switch
        {
            MoonEventType.Rise => "at moonrise",
            MoonEventType.Set => "at moonset",
            MoonEventType.ClearsHorizonProfile => "when the Moon clears your horizon profile",
            MoonEventType.HiddenByHorizonProfile => "when the Moon goes behind your horizon profile",
            _ => rising ? "when the Moon reaches your minimum altitude" : "when the Moon drops below your minimum altitude",
        };
    }

    private static string Below(Site site)
    {
        var parts = new List<string> { "below your horizon" };
        if (!site.Horizon.IsFlat) parts.Add("behind your horizon profile");
        if (site.MinimumAltitude.Degrees > 0) parts.Add("below the minimum altitude you set");
        return string.Join(" or ", parts);
    }

    private static string? Repeated(Instant instant, DateTimeZone zone)
    {
        if (zone == DateTimeZone.Utc) return null;
        var mapping = zone.MapLocal(instant.InZone(zone).LocalDateTime);
        if (mapping.Count < 2) return null;
        return mapping.First().Offset == zone.GetUtcOffset(instant) ? "first" : "second";
    }

    private static string DayMonth(LocalDate d) => $"{d.DayOfWeek} {d.Day} {Months[d.Month - 1]}";

    private static string DayMonthYear(LocalDate d) => DayMonth(d) + " " + (d.Year > 0 ? d.Year.ToString(CultureInfo.InvariantCulture) : $"{1 - d.Year} BC");
}
