//! A throwaway PostgreSQL cluster on loopback for tests and benchmarks: `initdb` into a
//! temporary folder, started on a free port, stopped and removed when dropped. As root (as on
//! CI machines), PostgreSQL runs as the `postgres` user, which refuses to run as root.
//! `UNDERCROFT_TEST_DATABASE_URL` (set by `scripts/with-postgres`) points the tests at a
//! cluster already running instead; each test then makes its own database in it.

use std::path::{Path, PathBuf};
use std::process::{Command, Stdio};

/// A database for one test: its URL, and the cluster that holds it when the test started one.
pub struct TestDatabase {
    pub url: String,
    /// The cluster this test started, when it has one of its own.
    pub cluster: Option<Cluster>,
}

/// A database in a cluster of the test's own, for tests that stop and start it.
pub fn own_database() -> TestDatabase {
    let cluster = Cluster::start().expect("a throwaway PostgreSQL cluster starts");
    TestDatabase {
        url: cluster.url(),
        cluster: Some(cluster),
    }
}

/// A database of its own for one test: in the shared cluster when one is named, else in a
/// cluster of its own.
pub fn test_database(name: &str) -> TestDatabase {
    if let Ok(admin) = std::env::var("UNDERCROFT_TEST_DATABASE_URL") {
        let db = format!("{name}_{}", std::process::id());
        let psql = |sql: &str| {
            let status = Command::new(bin_dir().join("psql"))
                .args(["-q", "-v", "ON_ERROR_STOP=1", &admin, "-c", sql])
                .stdout(Stdio::null())
                .status()
                .expect("psql runs");
            assert!(status.success(), "psql {sql}");
        };
        psql(&format!("DROP DATABASE IF EXISTS {db}"));
        psql(&format!("CREATE DATABASE {db}"));
        let url = replace_database(&admin, &db);
        return TestDatabase { url, cluster: None };
    }
    own_database()
}

/// The URL with its database name replaced.
fn replace_database(url: &str, db: &str) -> String {
    let (base, query) = url
        .split_once('?')
        .map_or((url, None), |(b, q)| (b, Some(q)));
    let cut = base
        .rfind('/')
        .filter(|&i| i > "postgres://".len())
        .unwrap_or(base.len());
    let mut out = format!("{}/{db}", &base[..cut]);
    if let Some(q) = query {
        out.push('?');
        out.push_str(q);
    }
    out
}

/// A running cluster of our own.
pub struct Cluster {
    dir: PathBuf,
    pub port: u16,
}

/// Where PostgreSQL's programs are: `pg_config --bindir`, else the newest Debian version.
pub fn bin_dir() -> PathBuf {
    if let Ok(out) = Command::new("pg_config").arg("--bindir").output() {
        let dir = PathBuf::from(String::from_utf8_lossy(&out.stdout).trim());
        if dir.join("initdb").exists() {
            return dir;
        }
    }
    let mut versions: Vec<PathBuf> = std::fs::read_dir("/usr/lib/postgresql")
        .map(|d| {
            d.filter_map(|e| e.ok().map(|e| e.path().join("bin")))
                .collect()
        })
        .unwrap_or_default();
    versions.retain(|d| d.join("initdb").exists());
    versions.sort_by_key(|d| {
        d.parent()
            .and_then(|v| v.file_name())
            .and_then(|v| v.to_str())
            .and_then(|v| v.parse::<u32>().ok())
            .unwrap_or(0)
    });
    versions
        .pop()
        .unwrap_or_else(|| PathBuf::from("/usr/lib/postgresql/15/bin"))
}

fn is_root() -> bool {
    Command::new("id")
        .arg("-u")
        .output()
        .map(|o| String::from_utf8_lossy(&o.stdout).trim() == "0")
        .unwrap_or(false)
}

/// A PostgreSQL program run as the user that may run it.
fn pg_command(program: &str) -> Command {
    let path = bin_dir().join(program);
    if is_root() {
        let mut c = Command::new("runuser");
        c.args(["-u", "postgres", "--"]).arg(path);
        c
    } else {
        Command::new(path)
    }
}

fn run(mut command: Command, what: &str) -> std::io::Result<()> {
    let out = command.stdin(Stdio::null()).output()?;
    if out.status.success() {
        Ok(())
    } else {
        Err(std::io::Error::other(format!(
            "{what} failed: {}{}",
            String::from_utf8_lossy(&out.stdout),
            String::from_utf8_lossy(&out.stderr)
        )))
    }
}

fn free_port() -> std::io::Result<u16> {
    Ok(std::net::TcpListener::bind("127.0.0.1:0")?
        .local_addr()?
        .port())
}

impl Cluster {
    /// A new cluster, initialised and started on a free loopback port.
    pub fn start() -> std::io::Result<Cluster> {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-pg-{}-{}",
            std::process::id(),
            crate::random::hex(6)
        ));
        std::fs::create_dir_all(&dir)?;
        if is_root() {
            run(
                {
                    let mut c = Command::new("chown");
                    c.args(["-R", "postgres:postgres"]).arg(&dir);
                    c
                },
                "chown",
            )?;
        }
        let data = dir.join("data");
        let mut init = pg_command("initdb");
        init.args([
            "-A",
            "trust",
            "-U",
            "undercroft",
            "-E",
            "UTF8",
            "--no-sync",
            "-D",
        ])
        .arg(&data);
        run(init, "initdb")?;
        let cluster = Cluster {
            dir,
            port: free_port()?,
        };
        cluster.start_server()?;
        Ok(cluster)
    }

    fn data(&self) -> PathBuf {
        self.dir.join("data")
    }

    fn start_server(&self) -> std::io::Result<()> {
        let options = format!(
            "-p {} -c listen_addresses=127.0.0.1 -k {} -c max_connections=200",
            self.port,
            self.dir.display()
        );
        let mut start = pg_command("pg_ctl");
        start
            .args(["-w", "-t", "60", "-D"])
            .arg(self.data())
            .args(["-l"])
            .arg(self.dir.join("log"))
            .args(["-o", &options, "start"]);
        run(start, "pg_ctl start")
    }

    /// Stops the server (fast: connections are cut, as in a crash of the clients' view).
    pub fn stop(&self) -> std::io::Result<()> {
        let mut stop = pg_command("pg_ctl");
        stop.args(["-w", "-D"])
            .arg(self.data())
            .args(["-m", "fast", "stop"]);
        run(stop, "pg_ctl stop")
    }

    /// Starts the server again on the same port.
    pub fn restart(&self) -> std::io::Result<()> {
        self.stop()?;
        self.start_server()
    }

    pub fn url(&self) -> String {
        format!(
            "postgres://undercroft@127.0.0.1:{}/postgres?sslmode=disable",
            self.port
        )
    }

    pub fn dir(&self) -> &Path {
        &self.dir
    }
}

impl Drop for Cluster {
    fn drop(&mut self) {
        let mut stop = pg_command("pg_ctl");
        stop.args(["-w", "-D"])
            .arg(self.data())
            .args(["-m", "immediate", "stop"])
            .stdout(Stdio::null())
            .stderr(Stdio::null());
        let _ = stop.status();
        let _ = std::fs::remove_dir_all(&self.dir);
    }
}

#[cfg(test)]
mod tests {
    #[test]
    fn a_database_name_is_put_in_place_of_the_url_s() {
        assert_eq!(
            super::replace_database("postgres://u@127.0.0.1:5/postgres?sslmode=disable", "t_1"),
            "postgres://u@127.0.0.1:5/t_1?sslmode=disable"
        );
        assert_eq!(
            super::replace_database("postgres://u@127.0.0.1:5", "t_1"),
            "postgres://u@127.0.0.1:5/t_1"
        );
    }
}
