using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace FilterQA.Data.Configuration;

/// <summary>Converts an instant to offset zero (PostgreSQL's timestamptz accepts only UTC values).</summary>
internal sealed class UtcNormalisingConverter() : ValueConverter<DateTimeOffset, DateTimeOffset>(
    value => value.ToUniversalTime(),
    value => value);
