#!/usr/bin/env bash
# CI check of the job-array script on a real batch scheduler: a single-node Slurm cluster on localhost from
# Debian's packages (munge, slurmctld, slurmd, slurm-client), configured and started in a private folder; a
# small 2-D sweep run by tools/cluster/scan-array.sbatch as an array of 4 tasks, merged, and compared byte for
# byte with the same sweep run in one process; a merge of 3 of the 4 shards must be refused.
# Skipped, with one line saying so, only when the packages cannot be installed.
#
#   tools/cluster/slurm-ci.sh [JAR]        (as root; JAR default connection/target/tertius.jar)
#
# The daemons run only for the test and are stopped on exit; on failure their logs and the tasks' logs are
# printed and kept in target/slurm-ci/.
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$PWD
jar=$root/${1:-connection/target/tertius.jar}
sweep=(--rectangle -0.7:0.7:5,0.3:3:4)
tasks=4
say() { echo "slurm-ci: $*"; }

[ -f "$jar" ] || { say "no jar at $jar (run mvn -B -q -DskipTests package first)"; exit 1; }

# --- the packages -----------------------------------------------------------------------------------------
have() { command -v slurmctld && command -v slurmd && command -v sbatch && command -v munged; }
if ! have > /dev/null; then
    if [ "$(id -u)" != 0 ] || ! command -v apt-get > /dev/null; then
        say "SKIPPED: Slurm is not installed and cannot be (needs root and apt-get)"
        exit 0
    fi
    apt_log=$(mktemp /tmp/tertius-slurm-apt.XXXXXX)
    if ! { DEBIAN_FRONTEND=noninteractive timeout 300 apt-get update -qq \
            && DEBIAN_FRONTEND=noninteractive timeout 600 apt-get install -y -qq --no-install-recommends \
                munge slurmctld slurmd slurm-client; } > "$apt_log" 2>&1 || ! have > /dev/null; then
        say "SKIPPED: the Debian packages munge, slurmctld, slurmd and slurm-client could not be installed" \
            "($(tail -n 1 "$apt_log"))"
        rm -f "$apt_log"
        exit 0
    fi
    rm -f "$apt_log"
fi
say "$(slurmctld -V), $(munged -V 2>&1 | head -n 1 | awk '{print $1}')"

# --- a private cluster ------------------------------------------------------------------------------------
work=$(mktemp -d /tmp/tertius-slurm-ci.XXXXXX)
mkdir -p "$work"/{munge,state,spool,run,log,shards}
chmod 700 "$work/munge"
pids=()
status=1
cleanup() {
    set +e
    if [ -n "${SLURM_CONF:-}" ] && [ -f "$SLURM_CONF" ]; then
        timeout 10 scancel --full --quiet --partition=ci > /dev/null 2>&1
    fi
    for ((k = ${#pids[@]} - 1; k >= 0; k--)); do
        kill "${pids[k]}" 2> /dev/null
    done
    for p in "${pids[@]}"; do
        for _ in $(seq 50); do kill -0 "$p" 2> /dev/null || break; sleep 0.1; done
        kill -9 "$p" 2> /dev/null
    done
    if [ "$status" != 0 ]; then
        rm -rf "$root/target/slurm-ci" && mkdir -p "$root/target/slurm-ci" && cp -r "$work/log" "$work/slurm.conf" \
            "$root/target/slurm-ci/" 2> /dev/null
        for f in "$work"/log/*; do
            [ -f "$f" ] && { echo "----- $(basename "$f") (last 40 lines)"; tail -n 40 "$f"; }
        done
        say "FAILED; logs kept in target/slurm-ci/"
    fi
    rm -rf "$work"
}
trap cleanup EXIT
trap 'exit 130' INT TERM

# munge: its own key, socket, pid, log and seed files
dd if=/dev/urandom of="$work/munge/munge.key" bs=1024 count=1 status=none
chmod 400 "$work/munge/munge.key"
socket=$work/munge/munge.socket
munged --foreground --force --key-file="$work/munge/munge.key" --socket="$socket" \
    --pid-file="$work/munge/munged.pid" --log-file="$work/log/munged.log" --seed-file="$work/munge/seed" \
    > "$work/log/munged.out" 2>&1 &
pids+=($!)
for _ in $(seq 50); do [ -S "$socket" ] && break; sleep 0.1; done
[ -S "$socket" ] || { say "munged did not start"; exit 1; }

host=$(hostname -s)
base=$((20000 + $$ % 20000))
node=$(slurmd -C | head -n 1 | sed "s/^NodeName=[^ ]*/NodeName=$host/")
export SLURM_CONF=$work/slurm.conf
: > "$work/plugstack.conf"
cat > "$SLURM_CONF" << CONF
ClusterName=tertiusci
SlurmctldHost=$host(127.0.0.1)
SlurmctldPort=$base
SlurmdPort=$((base + 1))
AuthType=auth/munge
CredType=cred/munge
AuthInfo=socket=$socket
SlurmUser=root
SlurmdUser=root
StateSaveLocation=$work/state
SlurmdSpoolDir=$work/spool
SlurmctldPidFile=$work/run/slurmctld.pid
SlurmdPidFile=$work/run/slurmd.pid
SlurmctldLogFile=$work/log/slurmctld.log
SlurmdLogFile=$work/log/slurmd.log
SlurmctldDebug=info
SlurmdDebug=info
PlugStackConfig=$work/plugstack.conf
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/none
MpiDefault=none
SchedulerType=sched/backfill
SelectType=select/cons_tres
SelectTypeParameters=CR_CPU
ReturnToService=2
MailProg=/bin/true
InactiveLimit=0
KillWait=5
MinJobAge=60
$node NodeAddr=127.0.0.1 State=UNKNOWN
PartitionName=ci Nodes=ALL Default=YES MaxTime=30 State=UP
CONF
slurmctld -D -i -f "$SLURM_CONF" > "$work/log/slurmctld.out" 2>&1 &
pids+=($!)
slurmd -D -f "$SLURM_CONF" > "$work/log/slurmd.out" 2>&1 &
pids+=($!)
state=
for _ in $(seq 120); do
    state=$(sinfo -h -N -o %t 2> /dev/null | head -n 1 || true)
    [ "$state" = idle ] && break
    sleep 0.5
done
[ "$state" = idle ] || { say "the node did not become idle within 60 s (state: '${state:-no answer}')"; exit 1; }
say "cluster up: node $host ($(echo "$node" | grep -o 'CPUs=[0-9]*')), partition ci"

# --- the sweep as a job array, its merge, and the same sweep in one process --------------------------------
start=$(date +%s)
TERTIUS_JAR=$jar timeout 900 sbatch --wait --quiet --array=1-$tasks --cpus-per-task=1 --time=10 \
    --output="$work/log/task-%a.log" tools/cluster/scan-array.sbatch "$work/shards" "${sweep[@]}" \
    || { say "the job array failed or timed out (sbatch status $?)"; exit 1; }
say "job array of $tasks tasks done in $(($(date +%s) - start)) s"
n=$(find "$work/shards" -name 'shard-*-of-4.csv' | wc -l)
[ "$n" = "$tasks" ] || { say "expected $tasks shard files, found $n"; exit 1; }
java -jar "$jar" merge --shards "$work/shards/shard-*-of-4.csv" --out "$work/merged.csv" --plot "$work/merged.png"
java -jar "$jar" scan "${sweep[@]}" --out "$work/single.csv" 2> "$work/log/single.log"
if ! cmp "$work/single.csv" "$work/merged.csv"; then
    diff "$work/single.csv" "$work/merged.csv" | head -n 20
    say "the merged shards differ from the single-process sweep"
    exit 1
fi
rows=$(($(wc -l < "$work/single.csv") - 3))
set +e
refusal=$(java -jar "$jar" merge --shards "$work/shards/shard-1-of-4.csv,$work/shards/shard-2-of-4.csv,$work/shards/shard-4-of-4.csv" \
    --out "$work/refused.csv" 2>&1)
refused=$?
set -e
if [ "$refused" != 2 ] || [ -e "$work/refused.csv" ] || [[ "$refusal" != *"shard 3/4 is missing"* ]]; then
    say "a merge without shard 3/4 was not refused as it should be (status $refused: $refusal)"
    exit 1
fi
status=0
say "PASSED: $tasks Slurm array tasks merged = single-process sweep, byte for byte ($rows rows); an incomplete set refused"
