/**
 * A three-node MariaDB Galera cluster on 127.0.0.1, owned by the project: each
 * node is a private MariaDB (local-mariadb.ts) with its data under one folder
 * (.data/galera/node1…3 for `npm run cluster:start`), an option file with its
 * wsrep settings, and ports of its own for SQL, group communication (gcomm),
 * incremental state transfer (IST) and state snapshot transfer (SST).
 *
 * Only node 1 is initialised with mariadb-install-db; nodes 2 and 3 start with
 * an empty data folder and receive everything (root's password included) from
 * a donor by a mariadb-backup SST, as a new machine joining a cluster would.
 * A node that was stopped or killed rejoins with its data folder: by IST when
 * the donor's write-set cache still holds what it missed, else by SST.
 * See docs/decisions/028-galera-test-cluster.md.
 */
import { execFile } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import mysql from "mysql2/promise";
import {
  appDatabaseName,
  connectAsRoot,
  ensureDatabasesAndAppUser,
  ensureMariadbInstalled,
  initialiseDataDir,
  mariadbLogTail,
  mariadbServerPid,
  portAnswers,
  serverSettings,
  serverUserArgs,
  startUnlessRunning,
  stopLocalMariadb,
  type MariadbInstance,
} from "./local-mariadb";
import { dataRoot } from "./project-paths";
import { findProgram, installDebianPackages } from "./run-command";

/** Debian's galera-4 puts the wsrep provider here. */
export const galeraProvider = "/usr/lib/galera/libgalera_smm.so";

/** `npm run cluster:start`'s first port when GALERA_BASE_PORT is not set. */
export const defaultGaleraBasePort = 3340;

/** The ports of the three nodes, in node order. */
export interface GaleraPorts {
  sql: [number, number, number];
  gcomm: [number, number, number];
  ist: [number, number, number];
  sst: [number, number, number];
}

/** Twelve ports from `base`: SQL base…+2, gcomm +3…+5, IST +6…+8, SST +9…+11. */
export function galeraPortsFrom(base: number): GaleraPorts {
  const three = (offset: number): [number, number, number] => [
    base + offset,
    base + offset + 1,
    base + offset + 2,
  ];
  return { sql: three(0), gcomm: three(3), ist: three(6), sst: three(9) };
}

export interface GaleraCluster {
  /** The folder holding every node's data, option file, socket, pid and log. */
  directory: string;
  /** wsrep_cluster_name: nodes of another cluster on the machine never join this one. */
  name: string;
  ports: GaleraPorts;
  nodes: [MariadbInstance, MariadbInstance, MariadbInstance];
  /** The SST user's password (mode 600), kept across starts. */
  sstCredentialsFile: string;
}

/** A cluster whose nodes live in `directory` (node1…3, node1.cnf, node1.log, …). */
export function galeraCluster(options: {
  directory: string;
  ports: GaleraPorts;
}): GaleraCluster {
  const { directory, ports } = options;
  const node = (index: number): MariadbInstance => {
    const base = path.join(directory, `node${index + 1}`);
    return {
      port: ports.sql[index]!,
      dataDir: base,
      socketPath: `${base}.sock`,
      pidFile: `${base}.pid`,
      logFile: `${base}.log`,
      // One set of passwords for the cluster: nodes 2 and 3 receive node 1's
      // mysql.* tables by state transfer.
      credentialsFile: path.join(directory, "credentials.json"),
      defaultsFile: `${base}.cnf`,
    };
  };
  return {
    directory,
    name: `turnledger-${ports.sql[0]}`,
    ports,
    nodes: [node(0), node(1), node(2)],
    sstCredentialsFile: path.join(directory, "sst-credentials.json"),
  };
}

/** The cluster `npm run cluster:start` runs: .data/galera, ports from GALERA_BASE_PORT (3340). */
export function projectGaleraCluster(): GaleraCluster {
  const setting = process.env.GALERA_BASE_PORT;
  const base = setting ? Number(setting) : defaultGaleraBasePort;
  if (!Number.isInteger(base) || base < 1024 || base > 65_523)
    throw new Error(
      `GALERA_BASE_PORT must be a port from 1024 to 65523 (it and the 11 after it are used); got "${setting}".`,
    );
  return galeraCluster({
    directory: path.join(dataRoot, "galera"),
    ports: galeraPortsFrom(base),
  });
}

const sstUser = "turnledger_sst";

/** mariadbd, mariadb-install-db, the wsrep provider, mariadb-backup and socat (SST streams through it). */
async function ensureGaleraInstalled() {
  const programs = await ensureMariadbInstalled();
  const missing = [
    ...(fs.existsSync(galeraProvider) ? [] : ["galera-4"]),
    ...(findProgram("mariadb-backup") ? [] : ["mariadb-backup"]),
    ...(findProgram("socat") ? [] : ["socat"]),
  ];
  if (missing.length > 0) {
    await installDebianPackages(
      missing,
      `The Galera cluster needs ${missing.join(", ")} and ${missing.length === 1 ? "it is" : "they are"} not installed.`,
    );
    if (!fs.existsSync(galeraProvider) || !findProgram("mariadb-backup"))
      throw new Error(
        `${galeraProvider} or mariadb-backup is still missing after the install.`,
      );
  }
  return programs;
}

function sstPassword(cluster: GaleraCluster): string {
  if (fs.existsSync(cluster.sstCredentialsFile))
    return (
      JSON.parse(fs.readFileSync(cluster.sstCredentialsFile, "utf8")) as {
        password: string;
      }
    ).password;
  const password = randomBytes(18).toString("base64url");
  fs.writeFileSync(
    cluster.sstCredentialsFile,
    JSON.stringify({ user: sstUser, password }, null, 2),
    { mode: 0o600 },
  );
  return password;
}

/** The option file of node `index` (0-based): every wsrep setting the node runs with. */
export function galeraNodeOptions(
  cluster: GaleraCluster,
  index: number,
  sstSecret: string,
): string {
  const { ports } = cluster;
  const node = cluster.nodes[index]!;
  const members = ports.gcomm.map((port) => `127.0.0.1:${port}`).join(",");
  const providerOptions = [
    `gmcast.listen_addr=tcp://127.0.0.1:${ports.gcomm[index]}`,
    `ist.recv_addr=127.0.0.1:${ports.ist[index]}`,
    // What a node that was away may catch up on by IST instead of a full SST.
    "gcache.size=256M",
  ].join(";");
  return [
    `# Written by scripts/lib/galera-cluster.ts at every cluster start; edits are lost.`,
    "[mysqld]",
    `datadir=${node.dataDir}`,
    `socket=${node.socketPath}`,
    `port=${node.port}`,
    "bind-address=127.0.0.1",
    "wsrep_on=ON",
    `wsrep_provider=${galeraProvider}`,
    `wsrep_cluster_name=${cluster.name}`,
    `wsrep_cluster_address=gcomm://${members}`,
    `wsrep_node_name=node${index + 1}`,
    `wsrep_node_address=127.0.0.1:${ports.gcomm[index]}`,
    `wsrep_provider_options="${providerOptions}"`,
    "wsrep_sst_method=mariabackup",
    `wsrep_sst_auth=${sstUser}:${sstSecret}`,
    `wsrep_sst_receive_address=127.0.0.1:${ports.sst[index]}`,
    // Galera replicates row events of InnoDB tables only, and needs
    // interleaved auto-increment locks (MariaDB's Galera "Mandatory options").
    "binlog_format=ROW",
    "default_storage_engine=InnoDB",
    "innodb_autoinc_lock_mode=2",
    // The migrations create triggers (item_counts, decision 050) as the app's user, which
    // has TRIGGER but not SUPER; with Galera's binary log on, MariaDB asks for this too.
    "log_bin_trust_function_creators=1",
    ...serverSettings,
    "",
    "[sst]",
    // No progress meter (pv): the SST's output goes to the node's log.
    "progress=none",
    "",
  ].join("\n");
}

function writeNodeOptions(cluster: GaleraCluster): void {
  const secret = sstPassword(cluster);
  cluster.nodes.forEach((node, index) =>
    fs.writeFileSync(
      node.defaultsFile!,
      galeraNodeOptions(cluster, index, secret),
      { mode: 0o600 },
    ),
  );
}

export interface GaleraNodeStatus {
  /** wsrep_local_state_comment: Synced, Donor/Desynced, Joining, Joined … */
  state: string;
  clusterSize: number;
  /** wsrep_cluster_status: Primary while the node is part of the quorum. */
  clusterStatus: string;
  /** wsrep_ready: ON when the node accepts queries. */
  ready: boolean;
}

/** What node `index` says of itself and its cluster (through its socket, as root). */
export async function galeraNodeStatus(
  cluster: GaleraCluster,
  index: number,
): Promise<GaleraNodeStatus> {
  const connection = await connectAsRoot(cluster.nodes[index]);
  try {
    const [rows] = await connection.query(
      "SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_state_comment', 'wsrep_cluster_size', 'wsrep_cluster_status', 'wsrep_ready')",
    );
    const status = new Map(
      (rows as { Variable_name: string; Value: string }[]).map((row) => [
        row.Variable_name,
        row.Value,
      ]),
    );
    return {
      state: status.get("wsrep_local_state_comment") ?? "",
      clusterSize: Number(status.get("wsrep_cluster_size") ?? 0),
      clusterStatus: status.get("wsrep_cluster_status") ?? "",
      ready: status.get("wsrep_ready") === "ON",
    };
  } finally {
    await connection.end();
  }
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Waits until node `index` reports Synced in a primary component of
 * `clusterSize` nodes; on timeout throws with the last status seen and the end
 * of the node's error log.
 */
export async function waitUntilNodeSynced(
  cluster: GaleraCluster,
  index: number,
  clusterSize: number,
  timeoutMs = 120_000,
): Promise<void> {
  const started = Date.now();
  let last: GaleraNodeStatus | string = "no answer yet";
  while (Date.now() - started < timeoutMs) {
    try {
      last = await galeraNodeStatus(cluster, index);
      if (
        last.state === "Synced" &&
        last.clusterStatus === "Primary" &&
        last.clusterSize === clusterSize
      )
        return;
    } catch (error) {
      last = String(error);
    }
    await sleep(250);
  }
  const node = cluster.nodes[index]!;
  throw new Error(
    `Galera node ${index + 1} (127.0.0.1:${node.port}) was not Synced in a cluster of ${clusterSize} within ${timeoutMs / 1000} s; ` +
      `last seen: ${typeof last === "string" ? last : JSON.stringify(last)}. The end of ${node.logFile}:\n${mariadbLogTail(node, 25)}`,
  );
}

/** grastate.dat's safe_to_bootstrap: 1 marks the node that left a cleanly stopped cluster last. */
function safeToBootstrap(node: MariadbInstance): boolean {
  const file = path.join(node.dataDir, "grastate.dat");
  return (
    fs.existsSync(file) &&
    /^safe_to_bootstrap:\s*1\s*$/m.test(fs.readFileSync(file, "utf8"))
  );
}

function hasData(node: MariadbInstance): boolean {
  return fs.existsSync(path.join(node.dataDir, "mysql"));
}

/** The index of the nodes whose mariadbd is running. */
export function runningGaleraNodes(cluster: GaleraCluster): number[] {
  return cluster.nodes.flatMap((node, index) =>
    mariadbServerPid(node) ? [index] : [],
  );
}

async function refuseTakenPorts(
  cluster: GaleraCluster,
  index: number,
): Promise<void> {
  const { ports } = cluster;
  for (const [what, port] of [
    ["SQL", ports.sql[index]!],
    ["gcomm", ports.gcomm[index]!],
    ["IST", ports.ist[index]!],
    ["SST", ports.sst[index]!],
  ] as const) {
    if (await portAnswers(port))
      throw new Error(
        `Port ${port} on 127.0.0.1 (node ${index + 1}'s ${what} port) is taken by another program. ` +
          `Stop it, or choose other ports with GALERA_BASE_PORT.`,
      );
  }
}

/** The seqno in grastate.dat: -1 while the node runs, and after it was killed. */
function savedSeqno(node: MariadbInstance): number | null {
  const file = path.join(node.dataDir, "grastate.dat");
  if (!fs.existsSync(file)) return null;
  const found = /^seqno:\s*(-?\d+)\s*$/m.exec(fs.readFileSync(file, "utf8"));
  return found ? Number(found[1]) : null;
}

/**
 * After a crash grastate.dat holds no position (seqno -1), and a node started
 * so would ask for a whole SST. `mariadbd --wsrep-recover` reads the last
 * committed position from InnoDB and exits; started at that position, the node
 * asks a donor only for what it missed (IST). Debian's galera_recovery does the
 * same for systemd.
 */
function recoveredPosition(
  server: string,
  node: MariadbInstance,
): Promise<string | null> {
  return new Promise((resolve, reject) => {
    execFile(
      server,
      [
        `--defaults-file=${node.defaultsFile}`,
        ...serverUserArgs(),
        "--wsrep-recover",
        "--disable-log-error",
        "--skip-networking",
        `--pid-file=${node.pidFile}.recover`,
      ],
      { timeout: 120_000 },
      (error, _stdout, stderr) => {
        const position = /WSREP: Recovered position:\s*(\S+)/.exec(stderr);
        if (position) resolve(position[1]!);
        else if (error)
          reject(
            new Error(
              `mariadbd --wsrep-recover failed for ${node.dataDir}: ${stderr.trim().split("\n").slice(-10).join("\n")}`,
            ),
          );
        else resolve(null);
      },
    );
  });
}

async function startNode(
  cluster: GaleraCluster,
  server: string,
  index: number,
  bootstrap: boolean,
): Promise<void> {
  const node = cluster.nodes[index]!;
  await refuseTakenPorts(cluster, index);
  fs.mkdirSync(node.dataDir, { recursive: true });
  const extraArguments = bootstrap ? ["--wsrep-new-cluster"] : [];
  if (!bootstrap && hasData(node) && savedSeqno(node) === -1) {
    const position = await recoveredPosition(server, node);
    if (position) {
      console.log(
        `[turnledger] Galera node ${index + 1} stopped without a clean shutdown; InnoDB's last position is ${position}`,
      );
      extraArguments.push(`--wsrep-start-position=${position}`);
    }
  }
  console.log(
    `[turnledger] Galera node ${index + 1}: ${bootstrap ? "bootstrapping the cluster (--wsrep-new-cluster)" : hasData(node) ? "rejoining (IST, or SST if too far behind)" : "joining with an empty data folder (SST by mariadb-backup)"} on 127.0.0.1:${node.port}`,
  );
  // A joiner answers only once its state transfer is done.
  await startUnlessRunning(server, node, {
    extraArguments,
    timeoutMs: 180_000,
  });
}

/**
 * Makes sure the cluster runs with all three nodes Synced, starting what is
 * not running: a new cluster is initialised on node 1 and bootstrapped there;
 * a stopped cluster is bootstrapped from the node that left it last; a node
 * that is down joins the others. `fresh` deletes every node's data first.
 * Creates the databases (utf8mb4) and the application user; returns the URL of
 * a database on each node.
 */
export async function ensureGaleraCluster(
  cluster: GaleraCluster,
  options: { databases?: string[]; fresh?: boolean } = {},
): Promise<{ urlFor(node: number, database: string): string }> {
  const programs = await ensureGaleraInstalled();
  if (options.fresh) {
    await stopGaleraCluster(cluster);
    fs.rmSync(cluster.directory, { recursive: true, force: true });
  }
  fs.mkdirSync(cluster.directory, { recursive: true });

  if (runningGaleraNodes(cluster).length === 0) {
    let bootstrapNode = cluster.nodes.findIndex(safeToBootstrap);
    if (!cluster.nodes.some(hasData)) {
      console.log(
        `[turnledger] initialising a new Galera cluster in ${cluster.directory}`,
      );
      fs.rmSync(cluster.sstCredentialsFile, { force: true });
      await initialiseDataDir(cluster.nodes[0], programs);
      bootstrapNode = 0;
    } else if (bootstrapNode < 0) {
      throw new Error(
        `No node in ${cluster.directory} is marked safe to bootstrap: the cluster was not stopped with npm run cluster:stop ` +
          `(a node was killed). Start afresh with \`npm run cluster:start -- --fresh\` (deletes the cluster's data), or set ` +
          `safe_to_bootstrap: 1 in the grastate.dat of the node with the highest seqno.`,
      );
    }
    writeNodeOptions(cluster);
    await startNode(cluster, programs.server, bootstrapNode, true);
    await waitUntilNodeSynced(cluster, bootstrapNode, 1);
  } else {
    writeNodeOptions(cluster);
  }

  // Users and databases are replicated to every node (DDL and account
  // statements run on all nodes at once): created on one running node.
  const running = runningGaleraNodes(cluster)[0]!;
  await ensureSstUser(cluster, running);
  const urlOn = await ensureDatabasesAndAppUser(
    cluster.nodes[running]!,
    options.databases ?? [appDatabaseName],
  );

  // One joiner at a time: each takes a whole snapshot from a donor.
  for (const index of [0, 1, 2]) {
    if (mariadbServerPid(cluster.nodes[index]!)) continue;
    await startNode(cluster, programs.server, index, false);
    await waitUntilNodeSynced(
      cluster,
      index,
      runningGaleraNodes(cluster).length,
    );
  }
  for (const index of [0, 1, 2]) await waitUntilNodeSynced(cluster, index, 3);

  const runningPort = cluster.ports.sql[running]!;
  return {
    urlFor: (node, database) =>
      urlOn(database).replace(
        `@127.0.0.1:${runningPort}/`,
        `@127.0.0.1:${cluster.ports.sql[node]}/`,
      ),
  };
}

async function ensureSstUser(
  cluster: GaleraCluster,
  index: number,
): Promise<void> {
  const connection = await connectAsRoot(cluster.nodes[index]);
  try {
    const secret = sstPassword(cluster);
    await connection.query(
      "CREATE USER IF NOT EXISTS ?@'localhost' IDENTIFIED BY ?",
      [sstUser, secret],
    );
    await connection.query("ALTER USER ?@'localhost' IDENTIFIED BY ?", [
      sstUser,
      secret,
    ]);
    // What mariadb-backup needs on the donor (MariaDB's "mariadb-backup SST
    // Method": RELOAD, PROCESS, LOCK TABLES and REPLICATION CLIENT, called
    // BINLOG MONITOR since 10.5).
    await connection.query(
      "GRANT RELOAD, PROCESS, LOCK TABLES, BINLOG MONITOR ON *.* TO ?@'localhost'",
      [sstUser],
    );
  } finally {
    await connection.end();
  }
}

/** Starts node `index` again (after a stop or a kill); it rejoins and is Synced in a cluster of three. */
export async function restartGaleraNode(
  cluster: GaleraCluster,
  index: number,
): Promise<void> {
  const { server } = await ensureGaleraInstalled();
  writeNodeOptions(cluster);
  await startNode(cluster, server, index, false);
  for (const node of [0, 1, 2]) await waitUntilNodeSynced(cluster, node, 3);
}

/** A crash: SIGKILL to node `index`'s mariadbd; waits until the process has gone. */
export async function killGaleraNode(
  cluster: GaleraCluster,
  index: number,
): Promise<void> {
  const pid = mariadbServerPid(cluster.nodes[index]!);
  if (!pid) return;
  process.kill(pid, "SIGKILL");
  const started = Date.now();
  while (Date.now() - started < 20_000) {
    try {
      process.kill(pid, 0);
    } catch {
      return;
    }
    await sleep(20);
  }
  throw new Error(`mariadbd ${pid} still runs 20 s after SIGKILL`);
}

/**
 * Stops every running node, node 3 first and node 1 last, so node 1 is the
 * one marked safe to bootstrap the next start. Returns how many were running.
 */
export async function stopGaleraCluster(
  cluster: GaleraCluster,
): Promise<number> {
  let stopped = 0;
  for (const index of [2, 1, 0]) {
    if (await stopLocalMariadb(cluster.nodes[index])) stopped += 1;
  }
  return stopped;
}

/** A root connection to node `index` (through its socket). */
export function connectToGaleraNode(
  cluster: GaleraCluster,
  index: number,
): Promise<mysql.Connection> {
  return connectAsRoot(cluster.nodes[index]);
}
