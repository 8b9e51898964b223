declare module '#api-routes' {
  const routes: Array<{ route: string; method: string }>
  export default routes
}
