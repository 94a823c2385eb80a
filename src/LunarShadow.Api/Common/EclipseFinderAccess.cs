using LunarShadow.Astronomy.Eclipses;
using LunarShadow.Astronomy.Shadow;

namespace LunarShadow.Api.Common;

/// <summary>The host's eclipse finders (a DI singleton, registered in ServiceRegistration), reached from a request.</summary>
internal static class EclipseFinderAccess
{
    /// <summary>The process's finder for a shadow model.</summary>
    public static EclipseFinder FinderFor(this HttpRequest request, ShadowModel model) =>
        request.HttpContext.RequestServices.GetRequiredService<EclipseFinders>().For(model);
}
