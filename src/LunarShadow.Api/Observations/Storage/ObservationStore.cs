using System.Data.Common;
using System.Globalization;
using LunarShadow.Api.Formatting;
using LunarShadow.Api.Observations.Keys;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Observations.Storage;

/// <summary>The outcome of storing a batch: every id, or the index of the first exact duplicate (then nothing was stored).</summary>
/// <param name="Ids">The new ids in request order; null when refused.</param>
/// <param name="DuplicateIndex">The index of the item that repeats one already stored by the same key (or earlier in the batch).</param>
internal sealed record StoreOutcome(IReadOnlyList<long>? Ids, int? DuplicateIndex);

/// <summary>
/// The observations table, on either dialect: a batch is stored in one transaction (all or nothing), with the key that
/// wrote it; reads return each kind oldest first.
/// </summary>
internal sealed class ObservationStore(StorageDialect dialect) : IObservationReader
{
    private const string Columns = "o.id, o.eclipse_date, o.kind, o.feature, o.crossing, o.danjon_value, o.observed_unix_ms, o.latitude_degrees, o.longitude_degrees, o.elevation_metres, o.uncertainty_seconds, o.optics, o.observer, o.received_unix_ms, k.name";

    /// <summary>Stores every draft, or none when one is an exact duplicate from the same key.</summary>
    public async Task<StoreOutcome> AddAsync(ObservatoryKey key, CalendarDate eclipse, IReadOnlyList<ObservationDraft> drafts, DateTimeOffset received, CancellationToken cancellationToken)
    {
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var transaction = await connection.BeginTransactionAsync(cancellationToken);
        var ids = new List<long>(drafts.Count);
        for (var i = 0; i < drafts.Count; i++)
        {
            var d = drafts[i];
            await using var command = connection.CreateCommand();
            command.Transaction = transaction;
            command.CommandText = """
                INSERT INTO observations (eclipse_date, kind, feature, crossing, danjon_value, observed_unix_ms, latitude_degrees,
                    longitude_degrees, elevation_metres, uncertainty_seconds, optics, observer, key_id, received_unix_ms, fingerprint)
                VALUES (@eclipse, @kind, @feature, @crossing, @value, @utc, @lat, @lon, @elevation, @uncertainty, @optics, @observer, @key, @received, @fingerprint)
                RETURNING id
                """;
            command.AddParameter("eclipse", eclipse.ToIsoDateString()).AddParameter("kind", d.Kind).AddParameter("feature", d.Feature)
                .AddParameter("crossing", d.Crossing is { } c ? Common.WireNames.Of(c) : null).AddParameter("value", d.DanjonValue)
                .AddParameter("utc", d.Utc.ToUnixTimeMilliseconds()).AddParameter("lat", d.Site.LatitudeDegrees)
                .AddParameter("lon", d.Site.LongitudeDegrees).AddParameter("elevation", d.Site.ElevationMetres)
                .AddParameter("uncertainty", d.UncertaintySeconds).AddParameter("optics", d.Optics).AddParameter("observer", d.Observer)
                .AddParameter("key", key.Id).AddParameter("received", received.ToUnixTimeMilliseconds()).AddParameter("fingerprint", d.Fingerprint);
            try
            {
                ids.Add(Convert.ToInt64(await command.ExecuteScalarAsync(cancellationToken), CultureInfo.InvariantCulture));
            }
            catch (DbException e) when (dialect.IsUniqueViolation(e))
            {
                await transaction.RollbackAsync(CancellationToken.None);
                return new StoreOutcome(null, i);
            }
        }
        await transaction.CommitAsync(cancellationToken);
        return new StoreOutcome(ids, null);
    }

    /// <inheritdoc />
    public async Task<IReadOnlyList<CraterTimingObservation>> CraterTimingsAsync(CalendarDate eclipse, CancellationToken cancellationToken) =>
        (await ListAsync(eclipse, ObservationKinds.CraterTiming, cancellationToken)).OfType<CraterTimingObservation>().ToList();

    /// <inheritdoc />
    public async Task<IReadOnlyList<DanjonObservation>> DanjonEstimatesAsync(CalendarDate eclipse, CancellationToken cancellationToken) =>
        (await ListAsync(eclipse, ObservationKinds.Danjon, cancellationToken)).OfType<DanjonObservation>().ToList();

    /// <summary>Every observation of an eclipse (of one kind, or both when kind is null), in the order they were stored.</summary>
    public async Task<IReadOnlyList<object>> ListAsync(CalendarDate eclipse, string? kind, CancellationToken cancellationToken)
    {
        await using var connection = await dialect.OpenAsync(cancellationToken);
        await using var command = connection.CreateCommand();
        command.CommandText = $"SELECT {Columns} FROM observations o JOIN observatory_keys k ON k.id = o.key_id WHERE o.eclipse_date = @eclipse"
            + (kind is null ? "" : " AND o.kind = @kind") + " ORDER BY o.id";
        command.AddParameter("eclipse", eclipse.ToIsoDateString());
        if (kind is not null) command.AddParameter("kind", kind);
        var list = new List<object>();
        await using var rows = await command.ExecuteReaderAsync(cancellationToken);
        while (await rows.ReadAsync(cancellationToken)) list.Add(Row(rows));
        return list;
    }

    private static object Row(DbDataReader r)
    {
        var id = Convert.ToInt64(r.GetValue(0), CultureInfo.InvariantCulture);
        if (!TimeFormats.TryParseDate(r.GetString(1), out var eclipse))
            throw new InvalidDataException($"Observation {id} has an unreadable eclipse date.");
        var utc = DateTimeOffset.FromUnixTimeMilliseconds(Convert.ToInt64(r.GetValue(6), CultureInfo.InvariantCulture));
        var site = new ObservationSite(r.GetDouble(7), r.GetDouble(8), r.GetDouble(9));
        string? Text(int i) => r.IsDBNull(i) ? null : r.GetString(i);
        var received = DateTimeOffset.FromUnixTimeMilliseconds(Convert.ToInt64(r.GetValue(13), CultureInfo.InvariantCulture));
        var keyName = r.GetString(14);
        return r.GetString(2) == ObservationKinds.Danjon
            ? new DanjonObservation(id, eclipse, r.GetDouble(5), utc, site, Text(12), keyName, received)
            : new CraterTimingObservation(id, eclipse, r.GetString(3), Text(4) == "emersion" ? CrossingDirection.Emersion : CrossingDirection.Immersion,
                utc, site, r.IsDBNull(10) ? null : r.GetDouble(10), Text(11), Text(12), keyName, received);
    }
}
