/** What a one-node test cluster's slurm.conf depends on. */
export interface LocalClusterSpec {
  /** The short host name (slurmd finds its node by it). */
  readonly host: string;
  readonly cpus: number;
  /** Folder for state, spool, pid and log files. */
  readonly dir: string;
}

/**
 * A minimal slurm.conf for this host alone: one node (reached on 127.0.0.1, no DNS), one default partition, consumable
 * cores (select/cons_tres), munge authentication, no accounting and no cgroups, SlurmUser root, files under `dir`.
 */
export function slurmConfText(spec: LocalClusterSpec): string {
  const { host, cpus, dir } = spec;
  return `# One-node Slurm for npm run test:slurm (written by test/cluster/local-slurm/).
ClusterName=atlas-test
SlurmctldHost=${host}(127.0.0.1)
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
SlurmctldPort=6817
SlurmdPort=6818
StateSaveLocation=${dir}/state
SlurmdSpoolDir=${dir}/spool
SlurmctldPidFile=${dir}/slurmctld.pid
SlurmdPidFile=${dir}/slurmd.pid
SlurmctldLogFile=${dir}/slurmctld.log
SlurmdLogFile=${dir}/slurmd.log
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SchedulerType=sched/backfill
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
AccountingStorageType=accounting_storage/none
JobAcctGatherType=jobacct_gather/none
JobCompType=jobcomp/none
MpiDefault=none
ReturnToService=2
NodeName=${host} NodeAddr=127.0.0.1 CPUs=${cpus} State=UNKNOWN
PartitionName=test Nodes=ALL Default=YES MaxTime=INFINITE State=UP
`;
}
