#!/usr/bin/env bash
# End-to-end check of the Slurm scale-out on this machine alone: stands up a single-node Slurm from
# Debian's packages (munge, slurmctld, slurmd), submits a sharded sweep of a shortened clamp demo through
# submit-study.sh (sbatch job array plus a dependent merge job), waits for it, and compares the merged
# folder with the folder an unsharded run of the same sweep writes, file by file (cmp).
#
# Prints one of, on its last line:
#   PASSED   the merged folder equals the unsharded one byte for byte            (exit 0)
#   FAILED   a job failed or the folders differ; logs are printed above          (exit 1)
#   SKIPPED  with the reason: not root, no apt-get, packages not installable,
#            daemons that will not start, ports already in use                   (exit 0)
# Needs root (it installs packages and starts daemons). It leaves /etc/slurm alone: the configuration,
# state and logs live in a temporary folder, removed at the end (KEEP=1 keeps it). It stops the daemons it
# started, by their process ids, and no others. Environment: BRANCHSIM_JAR (default: the jar of this
# checkout, built when missing), VARIANTS (default 6), SHARDS (default 3), CHECK_TIMEOUT (seconds to wait
# for the jobs, default 300). On a 2-core machine it took 12-20 s with the
# packages installed and 18 s installing them.
set -uo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
repo="$(cd "$here/../.." && pwd)"
jar=${BRANCHSIM_JAR:-$repo/sim-cli/target/branchsim.jar}
variants=${VARIANTS:-6}
shards=${SHARDS:-3}
timeout=${CHECK_TIMEOUT:-300}
started_at=$(date +%s)
work=""
started_pids=()

say() {
  echo "slurm check: $*"
}

finish() {
  local verdict=$1
  shift
  echo "slurm check: $verdict: $* ($(($(date +%s) - started_at)) s)"
  if [ "$verdict" = FAILED ]; then
    exit 1
  fi
  exit 0
}

cleanup() {
  if [ "${#started_pids[@]}" -gt 0 ] && [ -f "$work/slurm.conf" ]; then
    # the cluster is this script's own: cancel whatever is left on it so that no job outlives it
    SLURM_CONF="$work/slurm.conf" timeout 10 scancel --quiet --user=root 2> /dev/null
    for _ in $(seq 1 20); do
      [ -z "$(SLURM_CONF="$work/slurm.conf" timeout 5 squeue -h 2> /dev/null)" ] && break
      sleep 0.5
    done
  fi
  local pid
  for pid in "${started_pids[@]}"; do
    kill -TERM "$pid" 2> /dev/null
  done
  for pid in "${started_pids[@]}"; do
    for _ in $(seq 1 50); do
      kill -0 "$pid" 2> /dev/null || break
      sleep 0.1
    done
    kill -KILL "$pid" 2> /dev/null
  done
  if [ -n "$work" ] && [ "${KEEP:-0}" != 1 ]; then
    rm -rf "$work"
  elif [ -n "$work" ]; then
    echo "slurm check: kept $work"
  fi
}
trap cleanup EXIT
trap 'echo "slurm check: interrupted"; exit 130' INT TERM

# --- 1. Packages -----------------------------------------------------------------------------------
[ "$(id -u)" = 0 ] || finish SKIPPED "needs root to install Debian packages and start munged, slurmctld and slurmd"
packages=(munge slurmctld slurmd slurm-client)
missing=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2> /dev/null | grep -q "install ok installed" || missing+=("$p")
done
if [ "${#missing[@]}" -gt 0 ]; then
  command -v apt-get > /dev/null || finish SKIPPED "no apt-get to install ${missing[*]}"
  say "installing ${missing[*]} from Debian's packages"
  log=$(mktemp)
  if ! { DEBIAN_FRONTEND=noninteractive timeout 180 apt-get update -q &&
    DEBIAN_FRONTEND=noninteractive timeout 300 apt-get install -y -q --no-install-recommends "${missing[@]}"; } \
    > "$log" 2>&1; then
    tail -n 5 "$log"
    rm -f "$log"
    finish SKIPPED "the packages ${missing[*]} could not be installed (apt-get output above)"
  fi
  rm -f "$log"
fi
for tool in munged munge unmunge slurmctld slurmd sbatch squeue sinfo scontrol scancel; do
  command -v "$tool" > /dev/null || finish SKIPPED "$tool is missing after installing ${packages[*]}"
done

# --- 2. The branchsim jar ---------------------------------------------------------------------------
if [ ! -f "$jar" ]; then
  say "building $jar"
  (cd "$repo" && mvn -B -q -Dmaven.test.skip=true package) || finish FAILED "the branchsim jar could not be built"
fi
java -version > /dev/null 2>&1 || finish FAILED "no java on PATH for the jobs"

# --- 3. Configuration in a private folder -------------------------------------------------------------
work=$(mktemp -d /tmp/branchsim-slurm-check.XXXXXX)
chmod 755 "$work"
mkdir -p "$work/state" "$work/spool" "$work/log"
host=$(hostname -s)
cpus=$(nproc)
for port in 6817 6818; do
  if (exec 3<> "/dev/tcp/127.0.0.1/$port") 2> /dev/null; then
    finish SKIPPED "port $port on 127.0.0.1 is in use (another Slurm running here?)"
  fi
done
# A minimal single-node cluster (see man slurm.conf): the controller and the one node both on the
# loopback address; cores are the consumable resource (CR_CPU), memory is not, so that shards run side by
# side; no accounting database; process tracking without cgroups, which containers often lack.
cat > "$work/slurm.conf" << CONF
ClusterName=branchsim-check
SlurmctldHost=$host(127.0.0.1)
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
MpiDefault=none
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SchedulerType=sched/backfill
SelectType=select/cons_tres
SelectTypeParameters=CR_CPU
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/none
JobAcctGatherType=jobacct_gather/none
ReturnToService=2
MinJobAge=600
StateSaveLocation=$work/state
SlurmdSpoolDir=$work/spool
SlurmctldPidFile=$work/slurmctld.pid
SlurmdPidFile=$work/slurmd.pid
SlurmctldLogFile=$work/log/slurmctld.log
SlurmdLogFile=$work/log/slurmd.log
SlurmctldDebug=info
SlurmdDebug=info
NodeName=$host NodeAddr=127.0.0.1 CPUs=$cpus State=UNKNOWN
PartitionName=check Nodes=ALL Default=YES MaxTime=INFINITE State=UP
CONF
export SLURM_CONF="$work/slurm.conf"

# --- 4. Daemons ---------------------------------------------------------------------------------------
show_logs() {
  local f
  for f in "$work"/log/*.log "$@"; do
    [ -f "$f" ] || continue
    echo "--- $f (last lines)"
    tail -n 15 "$f"
  done
}

if ! munge -n 2> /dev/null | unmunge > /dev/null 2>&1; then
  mkdir -p /run/munge /var/log/munge /var/lib/munge
  chown munge:munge /run/munge /var/log/munge /var/lib/munge 2> /dev/null
  chmod 755 /run/munge
  if [ ! -s /etc/munge/munge.key ]; then
    (command -v mungekey > /dev/null && mungekey --create) ||
      dd if=/dev/urandom of=/etc/munge/munge.key bs=1 count=1024 status=none
    chown munge:munge /etc/munge/munge.key
    chmod 400 /etc/munge/munge.key
  fi
  rm -f /run/munge/munged.pid
  if ! runuser -u munge -- munged; then
    finish SKIPPED "munged would not start"
  fi
  for _ in $(seq 1 50); do
    [ -s /run/munge/munged.pid ] && break
    sleep 0.1
  done
  [ -s /run/munge/munged.pid ] && started_pids+=("$(cat /run/munge/munged.pid)")
  munge -n | unmunge > /dev/null 2>&1 || finish SKIPPED "munged started but does not answer (munge -n | unmunge)"
fi
say "munge works"

start_daemon() {
  local name=$1 pidfile=$2
  if ! "$name" -f "$SLURM_CONF"; then
    show_logs
    finish SKIPPED "$name would not start (its log is above)"
  fi
  for _ in $(seq 1 100); do
    [ -s "$pidfile" ] && break
    sleep 0.1
  done
  [ -s "$pidfile" ] || {
    show_logs
    finish SKIPPED "$name wrote no pid file (its log is above)"
  }
  started_pids+=("$(cat "$pidfile")")
}
start_daemon slurmctld "$work/slurmctld.pid"
start_daemon slurmd "$work/slurmd.pid"
state=""
for _ in $(seq 1 60); do
  state=$(sinfo -h -n "$host" -o %T 2> /dev/null | head -n 1)
  [ "$state" = idle ] && break
  sleep 1
done
if [ "$state" != idle ]; then
  show_logs
  finish SKIPPED "the node did not become idle (state \"$state\"; logs above)"
fi
say "single-node Slurm up: node $host, $cpus CPUs, partition check"

# --- 5. The study, unsharded here and sharded through Slurm -----------------------------------------
scenario="$work/clamp-short.json"
sed 's/"endTime": "3.5 s"/"endTime": "0.6 s"/' "$repo/scenarios/fixture-clamp.json" > "$scenario"
grep -q '"endTime": "0.6 s"' "$scenario" || finish FAILED "could not shorten the clamp demo's end time"
study=(sweep "$scenario" --vary "elements.reducer.dampingOrifice.diameter=0.5 mm..1 mm:$variants" --rank-by reducer.overshoot)

say "unsharded reference run ($variants variants)"
if ! java -Djava.awt.headless=true -jar "$jar" "${study[@]}" --threads "$cpus" --out "$work/unsharded" \
  > "$work/log/unsharded.out" 2>&1; then
  cat "$work/log/unsharded.out"
  finish FAILED "the unsharded sweep failed"
fi

say "submitting $shards shards and the merge through sbatch"
if ! submitted=$(cd "$work" && "$here/submit-study.sh" --shards "$shards" --out "$work/sharded" --jar "$jar" \
  --time 00:10:00 -- "${study[@]}" 2>&1); then
  echo "$submitted"
  finish FAILED "submit-study.sh failed"
fi
echo "$submitted"
ids=$(echo "$submitted" | tail -n 1)
array=$(echo "$ids" | sed -n 's/^array=\([0-9]*\) merge=[0-9]*$/\1/p')
merge=$(echo "$ids" | sed -n 's/^array=[0-9]* merge=\([0-9]*\)$/\1/p')
[ -n "$array" ] && [ -n "$merge" ] || finish FAILED "could not read the job ids from \"$ids\""

merge_state=""
deadline=$(($(date +%s) + timeout))
while [ "$(date +%s)" -lt "$deadline" ]; do
  merge_state=$(scontrol show job "$merge" 2> /dev/null | sed -n 's/.*JobState=\([A-Z_]*\).*/\1/p' | head -n 1)
  case "$merge_state" in
    COMPLETED | FAILED | CANCELLED | TIMEOUT | NODE_FAIL | OUT_OF_MEMORY | PREEMPTED | BOOT_FAIL | DEADLINE) break ;;
  esac
  sleep 2
done
say "array tasks of job $array:"
scontrol -o show job "$array" 2> /dev/null | while read -r line; do
  echo "  $(echo " $line" | grep -oE " (ArrayTaskId|JobState|ExitCode|NodeList)=[^ ]+" | tr -d '\n')"
done
say "merge job $merge: ${merge_state:-unknown}"
if [ "$merge_state" != COMPLETED ]; then
  show_logs "$work"/sharded/logs/*.out
  if [ -z "$merge_state" ] || [ "$(date +%s)" -ge "$deadline" ]; then
    finish FAILED "the merge job did not end within $timeout s (state \"$merge_state\"; logs above)"
  fi
  finish FAILED "the merge job ended $merge_state, so a shard or the merge failed (logs above)"
fi

# --- 6. Compare -------------------------------------------------------------------------------------
expected=$(cd "$work/unsharded" && ls -A | sort)
actual=$(cd "$work/sharded/merged" && ls -A | sort)
if [ "$expected" != "$actual" ]; then
  echo "unsharded: $expected"
  echo "merged:    $actual"
  finish FAILED "the merged folder holds other files than the unsharded one"
fi
for f in $expected; do
  if ! cmp "$work/unsharded/$f" "$work/sharded/merged/$f"; then
    finish FAILED "$f of the merged folder differs from the unsharded run's"
  fi
  say "same bytes: $f ($(wc -c < "$work/unsharded/$f") bytes)"
done
finish PASSED "$variants variants in $shards Slurm array tasks merged to the unsharded folder byte for byte"
