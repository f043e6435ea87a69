using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace FilterQA.Data.Configuration;

/// <summary>Stores an instant as its UTC ticks (100 ns since 0001-01-01 UTC); read back with offset zero.</summary>
internal sealed class UtcTicksConverter() : ValueConverter<DateTimeOffset, long>(
    value => value.UtcTicks,
    ticks => new DateTimeOffset(ticks, TimeSpan.Zero));
