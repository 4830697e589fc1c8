#!/usr/bin/env bash
# A single-node Slurm cluster on this machine, for the cluster tests (run as root).
# Installs slurm-wlm and munge when missing, writes a slurm.conf for this host (its CPUs and
# memory), makes a random munge key, starts munged (as munge), slurmctld and slurmd, and waits
# until sinfo shows the node idle. When slurmctld already answers, it does nothing.
set -euo pipefail

CONF_DIR=/etc/slurm
LOG_DIR=/var/log/slurm

if command -v scontrol >/dev/null 2>&1 && timeout 10 scontrol ping 2>/dev/null | grep -q 'is UP'; then
  echo "slurm-up: slurmctld already answers; nothing to do"
  exit 0
fi
if [ "$(id -u)" -ne 0 ]; then
  echo "slurm-up: needs root (installs packages and starts daemons)" >&2
  exit 1
fi

if ! command -v slurmctld >/dev/null 2>&1 || ! command -v slurmd >/dev/null 2>&1 || ! command -v munged >/dev/null 2>&1; then
  echo "slurm-up: installing slurm-wlm and munge"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq slurm-wlm munge >/dev/null
fi

host=$(hostname -s)
cpus=$(nproc --all)
mem_mb=$(awk '/^MemTotal:/ { print int($2 / 1024) }' /proc/meminfo)
# leave a little for the system, so slurmd never reports less than it was promised
real_mb=$(( mem_mb * 95 / 100 ))

mkdir -p "$CONF_DIR" "$LOG_DIR" /var/spool/slurmctld /var/spool/slurmd /run/munge /etc/munge
cat >"$CONF_DIR/slurm.conf" <<CONF
# written by scripts/ci/slurm-up.sh for a single-node test cluster on $host
ClusterName=gradus-ci
SlurmctldHost=$host
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
MpiDefault=none
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SelectType=select/cons_tres
SelectTypeParameters=CR_CPU_Memory
SchedulerType=sched/backfill
ReturnToService=2
StateSaveLocation=/var/spool/slurmctld
SlurmdSpoolDir=/var/spool/slurmd
SlurmctldPidFile=/run/slurmctld.pid
SlurmdPidFile=/run/slurmd.pid
SlurmctldLogFile=$LOG_DIR/slurmctld.log
SlurmdLogFile=$LOG_DIR/slurmd.log
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
# finished jobs stay visible to scontrol for ten minutes
MinJobAge=600
# a job that names no memory gets its CPUs' share, so jobs of one CPU run side by side
DefMemPerCPU=$(( real_mb / cpus ))
NodeName=$host CPUs=$cpus RealMemory=$real_mb State=UNKNOWN
PartitionName=main Nodes=$host Default=YES MaxTime=INFINITE State=UP
CONF

# a fresh random key, readable by munge alone
if [ ! -s /etc/munge/munge.key ]; then
  dd if=/dev/urandom of=/etc/munge/munge.key bs=1024 count=1 status=none
fi
chown munge:munge /etc/munge /etc/munge/munge.key /run/munge
chmod 700 /etc/munge
chmod 400 /etc/munge/munge.key
mkdir -p /var/lib/munge /var/log/munge
chown munge:munge /var/lib/munge /var/log/munge

if ! pgrep -u munge -x munged >/dev/null 2>&1; then
  runuser -u munge -- /usr/sbin/munged
fi
for i in $(seq 1 50); do
  munge -n 2>/dev/null | unmunge >/dev/null 2>&1 && break
  sleep 0.2
done

# a test cluster starts empty: jobs left queued by an earlier session must not run here (-c)
pgrep -x slurmctld >/dev/null 2>&1 || slurmctld -c
pgrep -x slurmd >/dev/null 2>&1 || slurmd

for i in $(seq 1 120); do
  state=$(sinfo -h -n "$host" -o '%t' 2>/dev/null | head -n1 || true)
  case "$state" in
    idle*) echo "slurm-up: node $host idle ($cpus CPUs, ${real_mb} MB)"; exit 0 ;;
    drain*|down*) scontrol update NodeName="$host" State=RESUME >/dev/null 2>&1 || true ;;
  esac
  sleep 0.5
done
echo "slurm-up: the node did not become idle (state: ${state:-none}); see $LOG_DIR" >&2
exit 1
