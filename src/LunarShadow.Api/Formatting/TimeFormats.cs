using System.Globalization;
using LunarShadow.Astronomy.Time;
using NodaTime;
using NodaTime.Text;

namespace LunarShadow.Api.Formatting;

/// <summary>How instants appear in responses: UTC as ISO 8601 with Z, TT as ISO 8601 without a zone (labelled TT).</summary>
internal static class TimeFormats
{
    private static readonly InstantPattern UtcPattern = InstantPattern.CreateWithInvariantCulture("uuuu-MM-dd'T'HH:mm:ss.fff'Z'");
    private static readonly LocalDateTimePattern TtPattern = LocalDateTimePattern.CreateWithInvariantCulture("uuuu-MM-dd'T'HH:mm:ss.fff");

    /// <summary>ISO 8601 UTC with millisecond precision and Z.</summary>
    public static string Utc(Instant instant) => UtcPattern.Format(ToMillisecond(instant));

    /// <summary>TT as an ISO 8601 local date-time (proleptic Gregorian, as ISO 8601 reckons), no zone.</summary>
    public static string Tt(TtInstant tt) => TtPattern.Format(ToMillisecond(Instant.FromJulianDate(tt.JulianDate.Day)).InUtc().LocalDateTime);

    // A Julian date in a double resolves about 40 µs; round to the nearest millisecond so that 0h does not print as 23:59:59.999.
    private static Instant ToMillisecond(Instant instant) =>
        Instant.FromUnixTimeTicks((long)Math.Round(instant.ToUnixTimeTicks() / 10_000.0, MidpointRounding.AwayFromZero) * 10_000);

    /// <summary>A number rounded for display.</summary>
    public static double Round(double value, int digits) => Math.Round(value, digits, MidpointRounding.AwayFromZero);

    /// <summary>Invariant-culture text of a number.</summary>
    public static string Text(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
