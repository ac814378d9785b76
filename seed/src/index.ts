export { demoAccounts, demoPassword, type DemoAccount } from './demo-accounts';
export { demoSignInLines, resetDemo, seedDemo, seedDemoIfEmpty } from './seed-demo';
