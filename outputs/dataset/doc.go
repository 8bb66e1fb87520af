// Package dataset writes and reads the solved range as a Parquet dataset:
// one flat row per case, streamed in row groups to a temporary file and
// renamed when complete, one part file per shard.
//
// # Units
//
// Every column carries its unit in its name: m for building geometry, m/s for
// wind speeds, kPa for pressures, kN for the hoist load, m³ for concrete, kg
// for mass. A Row's Go fields carry the same units in their names.
//
// # Layout
//
// A dataset is a directory of part files named part-KKKKK-of-NNNNN.parquet
// (K = shard, N = shard count; an unsharded run writes part-00001-of-00001).
// While a part is written it lives under a hidden temporary name
// (.part-KKKKK-of-NNNNN.parquet.tmp) in the same directory and is renamed
// atomically on Close, so no reader ever sees a half-written part. An
// interrupted run (Writer.Abort) finalizes the rows written so far as a valid
// Parquet file named part-KKKKK-of-NNNNN.parquet.partial with the metadata key
// complete=false; globs on *.parquet do not pick it up. Resume reads it back,
// checks that the grid and catalogue hashes match, copies its rows into a new
// temporary part and carries on, so the final part equals that of an
// uninterrupted run row for row (and byte for byte). A process killed
// outright (SIGKILL, power loss) leaves only the hidden temporary file, which
// has no footer; the next run overwrites it, and Resume starts from the last
// partial part, if there is one.
//
// # Metadata
//
// Each part's key-value metadata holds program_version, grid_sha256,
// catalog_sha256, schema_version, shard ("K/N") and complete ("true" or
// "false"). Rows are in enumeration order (case_index ascending), which is
// also the order of the tabulation keys, and the file declares that sorting.
package dataset
