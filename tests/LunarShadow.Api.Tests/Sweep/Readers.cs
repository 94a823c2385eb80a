using System.Globalization;
using System.Text.Json;
using CsvHelper;
using NetTopologySuite.Features;
using NetTopologySuite.Geometries;
using NetTopologySuite.IO.Converters;

namespace LunarShadow.Api.Tests.Sweep;

/// <summary>Reads each representation back with a general-purpose library and checks its form.</summary>
internal static class Readers
{
    private static readonly JsonSerializerOptions GeoJsonOptions = new() { Converters = { new GeoJsonConverterFactory() } };

    /// <summary>
    /// RFC 4180 via CsvHelper: a header, every record with the header's column count, and no non-finite number. Returns
    /// the records as strings.
    /// </summary>
    public static List<string[]> Csv(string text)
    {
        using var reader = CsvReader.FromText(text, new CsvReaderOptions
        {
            MalformedData = CsvMalformedDataHandling.Throw,
            FieldCountMismatch = CsvFieldCountHandling.Throw,
        });
        var columns = reader.Headers.Count;
        if (columns == 0) throw new InvalidDataException("CSV without a header");
        var rows = new List<string[]>();
        while (reader.Read())
        {
            if (reader.FieldCount != columns) throw new InvalidDataException($"CSV record {rows.Count + 1} has {reader.FieldCount} fields, the header {columns}");
            var row = Enumerable.Range(0, columns).Select(i => reader.GetString(i)).ToArray();
            foreach (var field in row)
            {
                if (field is "NaN" or "Infinity" or "-Infinity" || field.Contains('∞', StringComparison.Ordinal))
                    throw new InvalidDataException($"CSV record {rows.Count + 1} holds a non-finite number: {field}");
            }
            rows.Add(row);
        }
        return rows;
    }

    /// <summary>RFC 5545 via Ical.Net: the calendar parses; returns its events' start and end instants (UTC).</summary>
    public static List<(DateTime Start, DateTime End)> Calendar(string text)
    {
        var calendar = Ical.Net.Calendar.Load(text) ?? throw new InvalidDataException("iCalendar did not parse");
        return calendar.Events.Select(e => (e.DtStart!.AsUtc, e.DtEnd!.AsUtc)).ToList();
    }

    /// <summary>RFC 7946 via NetTopologySuite: every polygon's rings closed and valid, every position on the globe.</summary>
    public static int GeoJson(string text)
    {
        var collection = JsonSerializer.Deserialize<FeatureCollection>(text, GeoJsonOptions) ?? throw new InvalidDataException("GeoJSON did not parse");
        var polygons = 0;
        foreach (var feature in collection)
        {
            for (var i = 0; i < feature.Geometry.NumGeometries; i++)
            {
                var polygon = (Polygon)feature.Geometry.GetGeometryN(i);
                if (!polygon.ExteriorRing.IsClosed || polygon.InteriorRings.Any(r => !r.IsClosed)) throw new InvalidDataException("open ring");
                if (!polygon.IsValid) throw new InvalidDataException($"invalid polygon in {feature.Attributes["name"]}: {polygon}");
                if (polygon.Coordinates.Any(c => !double.IsFinite(c.X) || !double.IsFinite(c.Y) || Math.Abs(c.X) > 180 || Math.Abs(c.Y) > 90))
                    throw new InvalidDataException($"position off the globe in {feature.Attributes["name"]}");
                polygons++;
            }
        }
        return polygons;
    }

    /// <summary>An ISO 8601 instant of the API (years 1583 on) as a DateTimeOffset.</summary>
    public static DateTimeOffset Instant(string text) => DateTimeOffset.Parse(text, CultureInfo.InvariantCulture, DateTimeStyles.RoundtripKind);
}
