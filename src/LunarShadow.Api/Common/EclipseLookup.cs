using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Common;

/// <summary>
/// The step every per-eclipse endpoint shares: read the date, the computation choices and the format; refuse bad input
/// and unacceptable formats; find the eclipse or 404.
/// </summary>
internal static class EclipseLookup
{
    /// <summary>The date, shadow model, time scales and format of a per-eclipse request (problems on the reader).</summary>
    public static EclipseRequest Read(HttpRequest request, RequestFields f, FormatOffer offer)
    {
        var day = f.Date(Parameters.EclipseDate);
        var (model, time) = ModelChoice.Read(f);
        return new EclipseRequest(day, model, time, offer.Choose(request, f));
    }

    /// <summary>A problem response to return, or null with the eclipse found.</summary>
    public static IResult? Resolve(RequestFields f, EclipseRequest r, FormatOffer offer, out LunarEclipse eclipse)
    {
        eclipse = null!;
        if (!f.Reader.IsValid || r.Day is null) return Problems.InvalidQuery(f.Reader);
        if (r.Output is null) return Problems.NotAcceptable(offer.Formats);
        var start = JulianDate.FromCalendar(r.Day.Value.Year, r.Day.Value.Month, r.Day.Value.Day, r.Day.Value.IsGregorian).Day;
        var found = InDateRange(r.Model, r.Time, start, start + 1).FirstOrDefault();
        if (found is null)
            return Problems.NotFound($"No lunar eclipse has its greatest phase on {r.Day.Value.ToIsoDateString()} (UTC) under the {r.Model.Name} shadow model. List nearby eclipses with /api/v1/eclipses?from=…&to=….");
        eclipse = found;
        return null;
    }

    /// <summary>Eclipses whose greatest phase falls in [startDay, endDay) of UTC (Julian dates of 0h UTC).</summary>
    public static IEnumerable<LunarEclipse> InDateRange(ShadowModel model, TimeScaleConverter time, double startDay, double endDay)
    {
        // ΔT reaches about 13 hours at the ends of the span; search a day beyond each end, then keep by UTC.
        var from = TtInstant.FromJulianDate(startDay - 1);
        var to = TtInstant.FromJulianDate(endDay + 1);
        foreach (var e in EclipseFinder.For(model).Between(from, to))
        {
            var utc = time.ToUtc(e.GreatestEclipse).ToJulianDate();
            if (utc >= startDay && utc < endDay) yield return e;
        }
    }
}

/// <summary>A per-eclipse request as read.</summary>
/// <param name="Day">The eclipse's date, or null when invalid.</param>
/// <param name="Model">The shadow model.</param>
/// <param name="Time">The time scales.</param>
/// <param name="Output">The representation chosen, or null when the Accept header admits none.</param>
internal sealed record EclipseRequest(CalendarDate? Day, ShadowModel Model, TimeScaleConverter Time, OutputFormat? Output);
