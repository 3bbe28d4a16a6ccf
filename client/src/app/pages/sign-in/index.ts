export { SignIn as default } from './sign-in';
