import { SetPasswordScreen } from '@/components/account/set-password-screen';

export default SetPasswordScreen;
