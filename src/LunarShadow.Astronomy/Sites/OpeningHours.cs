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
            var (opens, openAdjustment) = Resolve(zone, date.At(Opens), opening: true);
            var (closes, closeAdjustment) = Resolve(zone, (SpansMidnight ? date.PlusDays(1) : date).At(Closes), opening: false);
            yield return new OpeningWindow(opens, closes, openAdjustment, closeAdjustment);
        }
    }

    // A local time may not exist (clocks go forward) or occur twice (clocks go back). Never shift it silently: take the
    // moment the clocks reach it (for a skipped time, the end of the gap) or, when it occurs twice, the first occurrence
    // for opening and the second for closing, and report it.
    private static (Instant Instant, ClockAdjustment? Adjustment) Resolve(DateTimeZone zone, LocalDateTime local, bool opening)
    {
        var mapping = zone.MapLocal(local);
        return mapping.Count switch
        {
            1 => (mapping.Single().ToInstant(), null),
            0 => (mapping.LateInterval.Start, new ClockAdjustment(local, ClockAdjustmentKind.SkippedTakenAsEndOfGap)),
            _ => opening
                ? (mapping.First().ToInstant(), new ClockAdjustment(local, ClockAdjustmentKind.RepeatedFirstUsed))
                : (mapping.Last().ToInstant(), new ClockAdjustment(local, ClockAdjustmentKind.RepeatedSecondUsed)),
        };
    }
}

/// <summary>One opening of the window, as instants.</summary>
/// <param name="Opens">When the doors open.</param>
/// <param name="Closes">When they close.</param>
/// <param name="OpensAdjustment">What was done because a daylight-saving change touched the opening time, if anything.</param>
/// <param name="ClosesAdjustment">The same for the closing time.</param>
public sealed record OpeningWindow(Instant Opens, Instant Closes, ClockAdjustment? OpensAdjustment = null, ClockAdjustment? ClosesAdjustment = null);

/// <summary>How a local clock reading touched by a daylight-saving change was resolved.</summary>
/// <param name="Asked">The local date and time asked for.</param>
/// <param name="Kind">What was done.</param>
public sealed record ClockAdjustment(LocalDateTime Asked, ClockAdjustmentKind Kind);

/// <summary>What was done with a local time that does not exist or occurs twice.</summary>
public enum ClockAdjustmentKind
{
    /// <summary>It does not exist (clocks go forward); the moment the clocks reach it, the end of the gap, is used.</summary>
    SkippedTakenAsEndOfGap,

    /// <summary>It occurs twice (clocks go back); the first occurrence is used.</summary>
    RepeatedFirstUsed,

    /// <summary>It occurs twice (clocks go back); the second occurrence is used.</summary>
    RepeatedSecondUsed,
}
