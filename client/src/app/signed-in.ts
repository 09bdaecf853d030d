// The signed-in app's frame and its first screen, in one chunk apart from the entry: a visitor
// who has not signed in yet loads neither, nor the local store and sync engine they bring.
export { TodayPage } from './pages/today-page';
export { AppShell } from './shell/app-shell';
