using System.ComponentModel;
using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;
using Microsoft.AspNetCore.Mvc;

namespace LunarShadow.Api.Validation;

// The computation choices every eclipse endpoint shares: shadow model, layer height, ΔT or its model. (No XML docs here:
// the OpenAPI document takes each parameter's text from its Description attribute.)
internal sealed record ModelParameters(
    [property: FromQuery(Name = "shadow"), Description(ShadowQuery.ShadowDescription)] string? Shadow,
    [property: FromQuery(Name = "layerKm"), Description(ShadowQuery.LayerDescription)] string? LayerKm,
    [property: FromQuery(Name = "deltaT"), Description(DeltaTQuery.DeltaTDescription)] string? DeltaT,
    [property: FromQuery(Name = "deltaTModel"), Description(DeltaTQuery.ModelDescription)] string? DeltaTModel)
{
    // The shadow model and the time scales, with problems reported on the reader.
    public (ShadowModel Model, TimeScaleConverter Time) Read(QueryReader reader) =>
        (ShadowQuery.Read(reader, Shadow, LayerKm), new TimeScaleConverter(DeltaTQuery.Read(reader, DeltaT, DeltaTModel)));
}
