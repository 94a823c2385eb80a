using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Eclipses;

/// <summary>The step every per-eclipse endpoint shares: refuse bad input, refuse unacceptable formats, find the eclipse or 404.</summary>
internal static class EclipseLookup
{
    /// <summary>A problem response to return, or null with the eclipse found.</summary>
    public static IResult? Resolve(QueryReader reader, CalendarDate? day, string date, OutputFormat? output, IEnumerable<OutputFormat> offered,
        EclipseFinder finder, TimeScaleConverter time, out LunarEclipse eclipse)
    {
        eclipse = null!;
        if (!reader.IsValid || day is null) return Problems.InvalidQuery(reader);
        if (output is null) return Problems.NotAcceptable(offered);
        var found = finder.OnUtcDate(day.Value, time);
        if (found is null)
            return Problems.NotFound($"No lunar eclipse has its greatest phase on {date} (UTC) under the {finder.Model.Name} shadow model. List nearby eclipses with /api/v1/eclipses?from=…&to=….");
        eclipse = found;
        return null;
    }
}
