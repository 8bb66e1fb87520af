#!/bin/bash
# Slurm job array: the Ridgeline Sheds range in 8 shards, one array task
# each, then a dependent job that writes the span tables and plots from all
# 8 dataset parts. Illustrative: adjust the partition, paths and limits.
#
#   jobid=$(sbatch --parsable testdata/examples/slurm-array.sh)
#   sbatch --dependency=afterok:"$jobid" --cpus-per-task=1 --wrap \
#     "spansweep sweep --grid grid.toml --out /scratch/$USER/spansweep/out --tables-only"
#
# Array task K (1 … 8) runs shard K/8 and writes
# $OUT/dataset/part-0000K-of-00008-piece-PPPPP.parquet on the shared file system.
# --signal sends SIGTERM 120 s before the time limit, so a task that runs
# out of time keeps its finished cases; resubmitting the array with the
# same command continues them (--resume).
#SBATCH --job-name=spansweep
#SBATCH --array=1-8
#SBATCH --cpus-per-task=2
#SBATCH --mem=2G
#SBATCH --time=01:00:00
#SBATCH --signal=TERM@120
#SBATCH --output=spansweep-%A_%a.log
set -euo pipefail

OUT=/scratch/$USER/spansweep/out
mkdir -p "$OUT"

srun spansweep sweep --grid grid.toml --out "$OUT" --shard "${SLURM_ARRAY_TASK_ID}/8" --workers "${SLURM_CPUS_PER_TASK}" --resume --quiet
