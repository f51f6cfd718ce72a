/**
 * Every screen that is not needed to sign in or to see the Bench, in one
 * module that the web bundle loads on first use (components/shell/lazy-screen.tsx).
 * One module, one `import()`: the bundler (Metro, Expo's web export) moves
 * anything two lazily loaded chunks share into a common chunk that loads with
 * the first page, so the charts, print and PDF code, level diagrams, compare
 * and admin screens stay out of the first load only if they hang off one
 * import. A new screen that belongs here: export it below and use
 * `lazyScreen('Name')` in its route file.
 */
export { AccountScreen } from '@/components/account/account-screen';
export { AdminAuditScreen } from '@/components/admin/audit-screen';
export { AccountsScreen } from '@/components/admin/accounts-screen';
export { NewBuildScreen } from '@/components/builds/new-build-screen';
export { CompareScreen } from '@/components/compare/compare-screen';
export { EditBowScreen } from '@/components/bows/edit-bow-screen';
export { BowScreen } from '@/components/bows/bow-screen';
export { LevelScreen } from '@/components/level/level-screen';
export { PredictScreen } from '@/components/predict/predict-screen';
export { ReadinessScreen } from '@/components/level/readiness-screen';
export { NewSightInScreen } from '@/components/sight-ins/new-sight-in-screen';
export { BowSharingScreen } from '@/components/shares/bow-sharing-screen';
export { NewBowScreen } from '@/components/bows/new-bow-screen';
export { BuildScreen } from '@/components/builds/build-screen';
export { CheckScreen } from '@/components/level/check-screen';
export { ClientsScreen } from '@/components/clients/clients-screen';
export { FieldCardScreen } from '@/components/field-card/field-card-screen';
export { MarksImportScreen } from '@/components/import-export/marks-import-screen';
export { SightInScreen } from '@/components/sight-ins/sight-in-screen';
export { TapeScreen } from '@/components/tapes/tape-screen';
export { DevMailScreen } from '@/components/dev-mail/dev-mail-screen';
export { InviteScreen } from '@/components/shares/invite-screen';
export { PrintSheetScreen } from '@/components/print/print-sheet-screen';
export { TryScreen } from '@/components/try/try-screen';
export { KeepTryScreen } from '@/components/try/keep-try-screen';
export { TuningScreen } from '@/components/tuning/tuning-screen';
export { ArrowSetsScreen } from '@/components/arrows/arrow-sets-screen';
export { PaperTuneScreen } from '@/components/tuning/paper-tune-screen';
