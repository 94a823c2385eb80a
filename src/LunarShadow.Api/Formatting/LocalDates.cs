using System.Globalization;
using LunarShadow.Astronomy.Sites;
using NodaTime;
using NodaTime.TimeZones;

namespace LunarShadow.Api.Formatting;

/// <summary>
/// Local calendar dates and zone names: dates in the astronomers' calendar (Julian before 1582 October 15, astronomical
/// year numbering), as <see cref="TimeFormats"/> writes them, and zone abbreviations from the tzdb.
/// </summary>
internal static class LocalDates
{
    private static readonly LocalDate GregorianReform = new(1582, 10, 15);

    /// <summary>An ISO-calendar date moved to the calendar the API writes (Julian before 1582-10-15).</summary>
    public static LocalDate InAstronomersCalendar(LocalDate date) =>
        date.Calendar == CalendarSystem.Iso && date < GregorianReform ? date.WithCalendar(CalendarSystem.Julian) : date;

    /// <summary>YYYY-MM-DD in the astronomers' calendar, e.g. 2028-12-31 or -0584-05-28.</summary>
    public static string Iso(LocalDate date)
    {
        var d = InAstronomersCalendar(date);
        var year = d.Year < 0
            ? "-" + (-d.Year).ToString("0000", CultureInfo.InvariantCulture)
            : d.Year.ToString("0000", CultureInfo.InvariantCulture);
        return string.Create(CultureInfo.InvariantCulture, $"{year}-{d.Month:00}-{d.Day:00}");
    }

    /// <summary>
    /// The abbreviation of the zone at an instant (e.g. CET, CEST, JST). Where the tzdb has only a numeric name (+14,
    /// +0545), it is written as UTC+14:00 or UTC+05:45.
    /// </summary>
    public static string Abbreviation(Instant instant, DateTimeZone zone) => Abbreviation(zone.GetZoneInterval(instant));

    /// <summary>The abbreviations in force during a night, in order of use (one, or two on a night the clocks change).</summary>
    public static IReadOnlyList<string> Abbreviations(LocalNight night, DateTimeZone zone) =>
        zone.GetZoneIntervals(night.Start(zone), night.End(zone)).Select(Abbreviation).Distinct().ToList();

    /// <summary>The UTC offset in force at an instant, e.g. UTC+09:00.</summary>
    public static string UtcOffset(Instant instant, DateTimeZone zone) => UtcOffset(zone.GetUtcOffset(instant));

    private static string Abbreviation(ZoneInterval interval)
    {
        var name = interval.Name;
        var numeric = string.IsNullOrEmpty(name) || name[0] is '+' or '-' || char.IsAsciiDigit(name[0]);
        return numeric ? UtcOffset(interval.WallOffset) : name;
    }

    private static string UtcOffset(Offset offset)
    {
        var seconds = offset.Seconds;
        var abs = Math.Abs(seconds);
        var text = string.Create(CultureInfo.InvariantCulture, $"UTC{(seconds < 0 ? '-' : '+')}{abs / 3600:00}:{abs / 60 % 60:00}");
        return abs % 60 == 0 ? text : text + string.Create(CultureInfo.InvariantCulture, $":{abs % 60:00}");
    }
}
