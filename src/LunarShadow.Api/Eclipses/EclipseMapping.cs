using LunarShadow.Api.Formatting;
using LunarShadow.Api.Common;
using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Eclipses;

/// <summary>Turns computed eclipses into response contracts and CSV.</summary>
internal static class EclipseMapping
{
    public static EclipseResponse ToResponse(LunarEclipse e, TimeScaleConverter time)
    {
        var deltaT = time.DeltaTAt(e.GreatestEclipse);
        var greatestUtc = time.ToUtc(e.GreatestEclipse);
        return new EclipseResponse(
            TimeFormats.UtcDate(greatestUtc),
            WireNames.Of(e.Kind),
            new InstantResponse(TimeFormats.Utc(greatestUtc), TimeFormats.Tt(e.GreatestEclipse), TimeFormats.Round(deltaT.UncertaintySeconds, 1)),
            TimeFormats.Round(deltaT.Seconds, 1),
            TimeFormats.Round(deltaT.UncertaintySeconds, 1),
            TimeFormats.Round(e.Gamma, 5),
            TimeFormats.Round(e.PenumbralMagnitude, 5),
            TimeFormats.Round(e.UmbralMagnitude, 5),
            new DurationsResponse(
                TimeFormats.Round(e.Durations.PenumbralMinutes, 2),
                e.Durations.PartialMinutes is { } p ? TimeFormats.Round(p, 2) : null,
                e.Durations.TotalMinutes is { } t ? TimeFormats.Round(t, 2) : null),
            e.Contacts.Select(c => new ContactResponse(c.Name.ToString(), TimeFormats.Utc(time.ToUtc(c.Tt)), TimeFormats.Tt(c.Tt),
                TimeFormats.Round(c.PositionAngle.Degrees, 1))).ToList(),
            new SarosResponse(e.Saros.Series, e.Saros.Member),
            new MoonPlaceResponse(
                TimeFormats.Round(e.MoonAtGreatest.RightAscension.Hours, 6),
                TimeFormats.Round(e.MoonAtGreatest.Declination.Degrees, 5),
                TimeFormats.Round(e.MoonAtGreatest.DistanceKm, 1),
                TimeFormats.Round(e.MoonAtGreatest.SemiDiameter.Arcseconds, 2)),
            new ShadowRadiiResponse(TimeFormats.Round(e.RadiiAtGreatest.Umbra.Degrees, 5), TimeFormats.Round(e.RadiiAtGreatest.Penumbra.Degrees, 5)),
            e.Model.Name,
            e.Model.Kind == ShadowModelKind.Layer ? e.Model.LayerHeightKm : null,
            e.Lunation,
            Diagram(e));
    }

    private static ShadowDiagramResponse Diagram(LunarEclipse e)
    {
        PathPointResponse Point(string name, TtInstant tt)
        {
            var g = e.Passage.At(e.Passage.HoursFromCenter(tt));
            const double degrees = 180 / Math.PI;
            return new PathPointResponse(name, TimeFormats.Round(Math.Atan(g.XiRadians) * degrees, 5), TimeFormats.Round(Math.Atan(g.EtaRadians) * degrees, 5));
        }
        var points = e.Contacts.Where(c => c.Name <= ContactName.U2).Select(c => Point(c.Name.ToString(), c.Tt))
            .Append(Point("greatest", e.GreatestEclipse))
            .Concat(e.Contacts.Where(c => c.Name >= ContactName.U3).Select(c => Point(c.Name.ToString(), c.Tt)))
            .ToList();
        return new ShadowDiagramResponse(TimeFormats.Round(e.RadiiAtGreatest.Umbra.Degrees, 5), TimeFormats.Round(e.RadiiAtGreatest.Penumbra.Degrees, 5),
            TimeFormats.Round(e.MoonAtGreatest.SemiDiameter.Degrees, 5), points);
    }

    public static string Csv(IEnumerable<EclipseResponse> eclipses)
    {
        var csv = new CsvWriter().Row("date", "kind", "greatest_utc", "greatest_tt", "delta_t_s", "delta_t_uncertainty_s", "gamma",
            "penumbral_magnitude", "umbral_magnitude", "penumbral_minutes", "partial_minutes", "total_minutes",
            "p1_utc", "u1_utc", "u2_utc", "u3_utc", "u4_utc", "p4_utc", "saros_series", "saros_member", "shadow_model");
        foreach (var e in eclipses)
        {
            string? Contact(string name) => e.Contacts.FirstOrDefault(c => c.Name == name)?.Utc;
            csv.Row(e.Date, e.Kind, e.GreatestEclipse.Utc, e.GreatestEclipse.Tt, e.DeltaTSeconds, e.DeltaTUncertaintySeconds, e.Gamma,
                e.PenumbralMagnitude, e.UmbralMagnitude, e.Durations.PenumbralMinutes, e.Durations.PartialMinutes, e.Durations.TotalMinutes,
                Contact("P1"), Contact("U1"), Contact("U2"), Contact("U3"), Contact("U4"), Contact("P4"), e.Saros.Series, e.Saros.Member, e.ShadowModel);
        }
        return csv.ToString();
    }
}
