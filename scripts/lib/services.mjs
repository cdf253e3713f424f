// Local fakes of hosted services, started by npm start and npm test for the chosen profile.
// Each script takes start|stop --profile=<name> and is idempotent.
export const SERVICES = [
  { name: "mail catcher", script: "scripts/mail-catcher.mjs" },
  { name: "fake S3", script: "scripts/s3-fake.mjs" },
  { name: "payments fake", script: "scripts/payments-fake.mjs" },
];
