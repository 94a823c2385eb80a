using NodaTime;

namespace LunarShadow.Astronomy.Sites;

/// <summary>
/// A night as people name it: the local calendar date of the evening and of the morning after (ISO calendar; a caller
/// showing dates before 1582 October 15 converts them to the Julian calendar).
/// </summary>
/// <param name="Evening">The date on which the night begins.</param>
/// <param name="Morning">The next date, on which it ends.</param>
public sealed record LocalNight(LocalDate Evening, LocalDate Morning)
{
    // Common practice (observing logs, e.g. the "night of 14/15 March" convention): a night runs from local noon to
    // the next local noon, and is named by both dates.
    /// <summary>The night, noon to noon local time, that holds an instant.</summary>
    public static LocalNight Around(Instant instant, DateTimeZone zone)
    {
        var local = instant.InZone(zone).LocalDateTime;
        var evening = local.Hour >= 12 ? local.Date : local.Date.PlusDays(-1);
        return new LocalNight(evening, evening.PlusDays(1));
    }

    /// <summary>Noon local time on the evening date, as an instant (the start of the night).</summary>
    public Instant Start(DateTimeZone zone) => zone.AtLeniently(Evening.At(new LocalTime(12, 0))).ToInstant();

    /// <summary>Noon local time on the morning date, as an instant (the end of the night).</summary>
    public Instant End(DateTimeZone zone) => zone.AtLeniently(Morning.At(new LocalTime(12, 0))).ToInstant();
}
