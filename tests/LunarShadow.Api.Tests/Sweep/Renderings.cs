using System.Text;
using System.Text.Json;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Photography;
using LunarShadow.Api.Sites;
using LunarShadow.Api.Validation;
using LunarShadow.Astronomy.Photography;
using LunarShadow.Astronomy.Sites;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>
/// Every representation the API offers, produced by the API's own mapping and formatting code without HTTP. This is the
/// one place that names those entry points: when the formatters move, re-point the calls here.
/// </summary>
internal static class Renderings
{
    private static readonly IServiceProvider Services = new ServiceCollection()
        .AddLogging()
        .AddSingleton(LunarShadow.Astronomy.Eclipses.EclipseFinders.Shared)
        .ConfigureHttpJsonOptions(o => FiniteNumbers.Configure(o.SerializerOptions))
        .BuildServiceProvider();

    public static string Json<T>(T value) => JsonSerializer.Serialize(value, FiniteNumbers.Web);

    public static LocalResponse Local(LocalCircumstances local, PublicNightPlan? plan) => LocalMapping.ToResponse(local, SweepGrid.Time, plan);

    public static string LocalCsv(LocalResponse response) => LocalFormats.Csv(response);

    public static string SitesCsv(IEnumerable<LocalResponse> responses) => LocalFormats.BatchCsv(responses);

    public static (int Status, string Body) LocalCalendar(LocalCircumstances local, LocalResponse response) =>
        Execute(LocalFormats.Calendar(local, null, response, NodaTime.SystemClock.Instance.GetCurrentInstant(), new QueryReader()));

    public static PhotoPlanResponse Photo(PhotoPlan plan) => PhotoMapping.ToResponse(plan, SweepGrid.Time);

    public static string PhotoCsv(PhotoPlanResponse response) => PhotoMapping.Csv(response);

    public static string PhotoSequence(PhotoPlanResponse response) => Json(PhotoMapping.Sequence(response));

    public static (int Status, string Body) PhotoCalendar(PhotoPlan plan) =>
        Written(PhotoFormats.ICalendar(plan, PhotoMapping.ToResponse(plan, SweepGrid.Time), NodaTime.SystemClock.Instance.GetCurrentInstant()));

    public static IReadOnlyList<UpcomingItem> UpcomingItems(IEnumerable<UpcomingEclipse> found, Site site) =>
        found.Select(u => UpcomingEndpoints.Item(u, site, SweepGrid.Time)).ToList();

    public static string UpcomingCsv(IReadOnlyList<UpcomingItem> items) => UpcomingFormats.Csv(items);

    public static (int Status, string Body) UpcomingCalendar(List<UpcomingEclipse> found, Site site) =>
        Written(UpcomingFormats.ICalendar(found, UpcomingItems(found, site), site, "every visible phase", NodaTime.SystemClock.Instance.GetCurrentInstant()));

    /// <summary>The visibility map as served: the endpoint's handler for one date, in GeoJSON.</summary>
    public static (int Status, string Body) VisibilityMap(string date)
    {
        var request = NewContext().Request;
        request.RouteValues["date"] = date;
        request.QueryString = new QueryString("?format=geojson");
        return Execute(Api.Eclipses.VisibilityMapEndpoints.Get(request));
    }

    // A file writer's answer as the endpoint sends it: the text, or a 400 when the years cannot be written in that format.
    private static (int Status, string Body) Written(string? text) => text is null ? (400, "") : (200, text);

    private static DefaultHttpContext NewContext() => new() { RequestServices = Services };

    private static (int Status, string Body) Execute(IResult result)
    {
        var context = NewContext();
        using var body = new MemoryStream();
        context.Response.Body = body;
        result.ExecuteAsync(context).GetAwaiter().GetResult();
        return (context.Response.StatusCode, Encoding.UTF8.GetString(body.ToArray()));
    }
}
