#!/usr/bin/env bash
# Runs a branchsim sweep or tolerance study on a Slurm cluster: a job array with one task per shard
# (shard.sbatch), then a merge job (merge.sbatch) that starts only when every shard has succeeded
# (--dependency=afterok) and is cancelled if one fails (--kill-on-invalid-dep=yes).
#
# Usage:
#   deploy/slurm/submit-study.sh [--shards N] [--out DIR] [--jar JAR] [--cpus C] [--time LIMIT]
#                                [--partition P] [--sbatch "MORE SBATCH OPTIONS"] -- STUDY...
# STUDY is the branchsim command line of the study without --shard, --out and --threads, e.g.
#   sweep scenarios/fixture-clamp.json --vary "elements.reducer.dampingOrifice.diameter=0.4 mm..1.2 mm:40"
#   tolerance scenarios/my-toleranced.json --runs 2000 --seed 7
# Each option may also come from the environment:
#   --shards     SHARDS          number of shards N, 1 to the number of variants (default 4)
#   --out        OUT_ROOT        results root (default out/slurm-<study>-<date-time>); it gets
#                                shard-K-of-N/ per shard, merged/ (the study's folder, the same as an
#                                unsharded run writes) and logs/ (each job's output)
#   --jar        BRANCHSIM_JAR   the branchsim jar (default sim-cli/target/branchsim.jar of this checkout;
#                                build it with: mvn -B -DskipTests package)
#   --cpus       CPUS_PER_SHARD  cores per shard, used as --threads (default 1)
#   --time       TIME_LIMIT      time limit per job (default 01:00:00)
#   --partition  PARTITION       partition (default: the cluster's default)
#   --sbatch     SBATCH_EXTRA    more sbatch options for every job, e.g. "--mem=4G --account=proj"
# The scenario, the jar and OUT_ROOT must be on a file system every node sees; relative paths are taken
# from the current folder, which is also each job's working folder.
# The last line printed is "array=<job id> merge=<job id>", for scripts that wait for the jobs.
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
repo="$(cd "$here/../.." && pwd)"
shards=${SHARDS:-4}
root=${OUT_ROOT:-}
jar=${BRANCHSIM_JAR:-$repo/sim-cli/target/branchsim.jar}
cpus=${CPUS_PER_SHARD:-1}
limit=${TIME_LIMIT:-01:00:00}
partition=${PARTITION:-}
extra=${SBATCH_EXTRA:-}

die() {
  echo "submit-study.sh: $*" >&2
  exit 2
}

while [ "$#" -gt 0 ]; do
  case "$1" in
    --shards) shards=${2:?--shards needs a value}; shift 2 ;;
    --out) root=${2:?--out needs a value}; shift 2 ;;
    --jar) jar=${2:?--jar needs a value}; shift 2 ;;
    --cpus) cpus=${2:?--cpus needs a value}; shift 2 ;;
    --time) limit=${2:?--time needs a value}; shift 2 ;;
    --partition) partition=${2:?--partition needs a value}; shift 2 ;;
    --sbatch) extra=${2:?--sbatch needs a value}; shift 2 ;;
    --) shift; break ;;
    *) die "expected an option or -- before the study, found \"$1\"" ;;
  esac
done

[ "$#" -ge 2 ] || die "expected the study after --: sweep|tolerance SCENARIO [OPTIONS...]"
case "$1" in
  sweep | tolerance) ;;
  *) die "expected the study command sweep or tolerance after --, found \"$1\"" ;;
esac
for arg in "$@"; do
  case "$arg" in
    --shard | --shard=* | --out | --out=* | --threads | --threads=*)
      die "the study takes no $arg: submit-study.sh sets --shard, --out and --threads for each job" ;;
  esac
done
[[ "$shards" =~ ^[1-9][0-9]*$ ]] || die "--shards: expected a whole number of at least 1, found \"$shards\""
[[ "$cpus" =~ ^[1-9][0-9]*$ ]] || die "--cpus: expected a whole number of at least 1, found \"$cpus\""
[ -f "$jar" ] || die "--jar: expected the branchsim jar, found no file $jar (build: mvn -B -DskipTests package)"
[ -f "$2" ] || die "expected the scenario file after the study command, found no file \"$2\""
command -v sbatch > /dev/null || die "sbatch not found: run this on a Slurm login node"

root=${root:-out/slurm-$1-$(date +%Y%m%d-%H%M%S)}
mkdir -p "$root/logs"
root="$(cd "$root" && pwd)"
jar="$(cd "$(dirname "$jar")" && pwd)/$(basename "$jar")"

common=(--parsable --chdir="$PWD" --time="$limit")
[ -n "$partition" ] && common+=(--partition="$partition")
read -r -a more <<< "$extra"

array=$(sbatch "${common[@]}" "${more[@]}" --array="1-$shards" --cpus-per-task="$cpus" \
  --job-name=branchsim-shard --output="$root/logs/shard-%a-of-$shards.out" \
  "$here/shard.sbatch" "$jar" "$shards" "$root" "$@")
array=${array%%;*}
merge=$(sbatch "${common[@]}" "${more[@]}" --dependency="afterok:$array" --kill-on-invalid-dep=yes \
  --job-name=branchsim-merge --output="$root/logs/merge.out" \
  "$here/merge.sbatch" "$jar" "$shards" "$root")
merge=${merge%%;*}

echo "submitted $shards shards as job array $array and the merge as job $merge"
echo "results: $root/merged (shards in $root/shard-K-of-$shards, logs in $root/logs)"
echo "follow with: squeue -j $array,$merge"
echo "array=$array merge=$merge"
