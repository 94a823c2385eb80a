using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>A daily opening window in local time, such as 19:00–23:30; it spans midnight when it closes at or before it opens.</summary>
/// <param name="Opens">Local opening time.</param>
/// <param name="Closes">Local closing time.</param>
public sealed record OpeningHours(LocalTime Opens, LocalTime Closes)
{
    /// <summary>True when the window runs past midnight into the next day.</summary>
    public bool SpansMidnight => Closes <= Opens;

    /// <summary>The windows opening on the local dates from <paramref name="first"/> to <paramref name="last"/>.</summary>
    public IEnumerable<OpeningWindow> Windows(DateTimeZone zone, LocalDate first, LocalDate last)
    {
        for (var date = first; date <= last; date = date.PlusDays(1))
        {
            var (opens, openNote) = Resolve(zone, date.At(Opens), opening: true);
            var (closes, closeNote) = Resolve(zone, (SpansMidnight ? date.PlusDays(1) : date).At(Closes), opening: false);
            var notes = new[] { openNote, closeNote }.Where(n => n is not null).ToList();
            yield return new OpeningWindow(opens, closes, notes.Count == 0 ? null : string.Join(" ", notes));
        }
    }

    // A local time may not exist (clocks go forward) or occur twice (clocks go back). Never shift it silently: take the
    // moment the clocks reach it (for a skipped time, the end of the gap) or, when it occurs twice, the first occurrence
    // for opening and the second for closing, and say so.
    private static (Instant Instant, string? Note) Resolve(DateTimeZone zone, LocalDateTime local, bool opening)
    {
        var mapping = zone.MapLocal(local);
        var what = opening ? "opening" : "closing";
        return mapping.Count switch
        {
            1 => (mapping.Single().ToInstant(), null),
            0 => (mapping.LateInterval.Start,
                $"The {what} time {local:HH:mm} on {local:yyyy-MM-dd} does not exist (clocks go forward); taken as {mapping.LateInterval.Start.InZone(zone):HH:mm}."),
            _ => (opening ? mapping.First().ToInstant() : mapping.Last().ToInstant(),
                $"The {what} time {local:HH:mm} on {local:yyyy-MM-dd} occurs twice (clocks go back); the {(opening ? "first" : "second")} is used."),
        };
    }
}

/// <summary>One opening of the window, as instants.</summary>
/// <param name="Opens">When the doors open.</param>
/// <param name="Closes">When they close.</param>
/// <param name="Note">What was done about a daylight-saving change, if one touched the window.</param>
public sealed record OpeningWindow(Instant Opens, Instant Closes, string? Note);
